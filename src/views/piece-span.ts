import type { PlasticPieceResult } from '../results/plastic-result.ts';
import type { Results } from '../results/results.ts';
import { show } from './display-units.ts';

type Units = Results['case']['units'];

/** '"sheave seat" 60 mm to 120 mm, Ø55 mm' for a piece of shaft (of the energy balance or the dynamic model), in the case's units. */
export function describePlasticPiece(p: Pick<PlasticPieceResult, 'piece'>, u: Units, text: (s: string) => string = (s) => s): string {
  const seg = p.piece.segment;
  const name = seg.label ? `"${text(seg.label)}"` : `segment ${seg.index + 1}`;
  return `${name} ${show(p.piece.start, 'length', u)} to ${show(p.piece.end, 'length', u)}, Ø${show(seg.diameter, 'length', u)}${seg.bore > 0 ? ` bore ${show(seg.bore, 'length', u)}` : ''}`;
}
