import type { Case, Segment } from '../case/case.ts';
import type { Chain, ChainElement } from '../model/chain.ts';
import { isBrittle } from '../physics/fracture.ts';
import type { TorsionLaw } from '../physics/plastic-torsion.ts';
import { SeriesBackbone } from '../physics/series-backbone.ts';
import { shearYield } from '../physics/shear-strength.ts';
import { linearHardeningModulus } from '../physics/strain-hardening.ts';

/**
 * A ductile segment's torque–twist law for the time-domain model, as the energy balance builds it
 * (`side-balance.ts`): the net section (no K_t), the case criterion's shear yield, linear
 * hardening when `analysis.hardening` asks for it and the material allows. Undefined for a brittle
 * material, which stays elastic up to fracture.
 */
export function segmentLaw(c: Case, seg: Segment): TorsionLaw | undefined {
  const m = c.materials[seg.material];
  if (isBrittle(m) || m.yieldStrength === undefined) return undefined;
  const tauY = shearYield(m.yieldStrength, c.analysis.criterion);
  const slope = c.analysis.hardening === 'linear' ? linearHardeningModulus(m, tauY / m.yieldStrength) : undefined;
  return { outerRadius: seg.diameter / 2, innerRadius: seg.bore / 2, shearModulus: m.shearModulus!, shearYield: tauY, hardeningModulus: slope ?? 0 };
}

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
