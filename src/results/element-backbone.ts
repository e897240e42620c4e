import type { Case } from '../case/case.ts';
import type { Chain, ChainElement } from '../model/chain.ts';
import { SeriesBackbone } from '../physics/series-backbone.ts';
import { segmentLaw } from './side-balance.ts';

/**
 * The first-loading curve of a chain element from the pieces it spans (each piece's overlap with
 * the element); undefined when any of them is brittle (the element is then kept elastic).
 */
export function elementBackbone(c: Case, chain: Chain, el: ChainElement): SeriesBackbone | undefined {
  const parts = [];
  for (const i of el.pieces) {
    const p = chain.pieces[i].piece;
    const law = segmentLaw(c, p.segment);
    if (!law) return undefined;
    const length = Math.min(el.end, p.end) - Math.max(el.start, p.start);
    if (length > 0) parts.push({ law, length });
  }
  return parts.length > 0 ? new SeriesBackbone(parts, el.stiffness) : undefined;
}
