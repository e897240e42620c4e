import type { DynamicPiece } from '../results/dynamic-result.ts';
import { balancePieceOf } from '../results/plastic-result.ts';
import type { Results } from '../results/results.ts';
import { show, sig } from './display-units.ts';
import { describePlasticPiece } from './piece-span.ts';

type Units = Results['case']['units'];

/** '"sheave seat" 60 mm to 120 mm, Ø55 mm' for a piece of the dynamic model, in the case's units; `text` escapes the label. */
export function describeDynamicPiece(p: DynamicPiece, u: Units, text: (s: string) => string = (s) => s): string {
  return describePlasticPiece(p, u, text);
}

/** The piece with the largest permanent twist in the dynamic model. */
export function mostTwisted(r: Results): DynamicPiece {
  return r.dynamic.pieces.reduce((b, p) => (p.permanentTwist > b.permanentTwist ? p : b), r.dynamic.pieces[0]);
}

/**
 * The law the dynamic model's shaft elements carry past yield, in words: ductile pieces on the net
 * section with the case's hardening and Masing's rule, brittle pieces up to their fracture stress.
 */
export function dynamicLawWords(r: Results): string {
  const facts = r.plastic.sides.flatMap((s) => s.pieces);
  const law = r.case.analysis.hardening === 'linear' ? 'linear strain hardening' : 'elastic–perfectly plastic';
  const ductile = facts.length === 0 || facts.some((p) => !p.brittle);
  const brittle = facts.some((p) => p.brittle);
  return [
    ...(ductile ? [`${brittle ? 'ductile pieces' : 'its shaft elements'} ${law} on the net section, Masing's rule on reversals${brittle ? ', breaking at their fracture strain' : ''}`] : []),
    ...(brittle ? ['brittle pieces elastic up to their fracture stress (kt applied), then broken'] : []),
  ].join('; ');
}

/** The dynamic model's result past yield for `check`: each piece that yielded or broke. */
export function dynamicPastYieldLines(r: Results): string[] {
  const u = r.case.units;
  const d = r.dynamic;
  const out = ['', `Past yield in time (the finding's model past yield: ${dynamicLawWords(r)}):`];
  const hit = d.pieces.filter((p) => p.permanentTwist > 0 || p.broken);
  if (hit.length === 0) out.push('  No piece yields through its net section.');
  for (const p of hit) {
    const f = balancePieceOf(r.plastic, p)?.piece;
    const fs = f?.fractureStrain === undefined ? 'fracture strain unknown' : `fracture at ${sig(f.fractureStrain)}`;
    const state = p.broken ? `BREAKS at ${sig((p.breakTime ?? 0) * 1000)} ms` : `permanent ${show(p.permanentTwist, 'angle', u)}, shear strain ${sig(p.maxShearStrain)} (${fs})`;
    out.push(`  Side ${p.side}, ${describeDynamicPiece(p, u)}: peak torque ${show(p.peakTorque, 'torque', u)}, ${state}`);
  }
  if (d.yielded) out.push(`  plastic work in the shaft ${show(d.plasticWork, 'energy', u)}`);
  return out;
}
