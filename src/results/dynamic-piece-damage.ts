import type { Chain } from '../model/chain.ts';
import { PlasticElementLaw } from '../physics/plastic/plastic-element-law.ts';
import { residualTwistRate, rigidity } from '../physics/plastic/plastic-torsion.ts';
import { ShearPinLaw } from '../physics/shear-pin-law.ts';
import type { TorqueLaw } from '../physics/torque-law.ts';
import { shearStress } from '../physics/torsion.ts';

/** What the incident left in one piece of shaft, by the dynamic model. */
export interface PieceDamage {
  /** Twist left after the incident, rad (0 where it stayed elastic, broke, or plasticity is off). */
  permanentTwist: number;
  /** Largest outer-fibre shear strain it reached (net section), rad; with plasticity off, or where the piece has no elastic–plastic element, the elastic strain of its peak torque. */
  maxShearStrain: number;
  /** Whether an element in the piece broke. */
  broken: boolean;
}

/**
 * The damage of each piece after the incident. Permanent twist: elastic unloading from the largest
 * twist each of its elements reached (by Masing's rule always a point of first loading),
 * φ_p = φ − T/GJ_p per length (shared REFERENCE 3.1.6, `residualTwistRate`), over the part of the
 * piece in the element; each piece's share of the element's twist from
 * `SeriesBackbone.pieceTwistRates`. A broken element leaves no measurable twist (the parts have
 * separated); its piece is marked broken. An element that never yielded was stepped as elastic
 * without its largest twist kept (`TorqueLaw.elasticUntilEvent`): its pieces' strain is the elastic
 * one of their peak torque, T·c/(G·J_p), from `piecePeak` (N·m, per piece) where it is given. So
 * is the strain of a piece in an element of another law (plain elastic, a limiter's or a pin's
 * element, a brittle element, before it broke): T·c/(G·J_p) = τ/G at the piece's peak torque, net
 * section, with `shearModulus` (Pa, per piece) where it is given (Shigley 9th ed. Sec. 3-12,
 * τ = Tc/J and γ = τ/G; from memory, confident).
 */
export function dynamicPieceDamage(chain: Chain, laws: readonly TorqueLaw[], piecePeak?: readonly number[], shearModulus?: readonly number[]): PieceDamage[] {
  const elasticStrain = (i: number) => {
    const seg = chain.pieces[i].piece.segment;
    return piecePeak && shearModulus ? shearStress(piecePeak[i], seg.diameter, seg.bore) / shearModulus[i] : 0;
  };
  const out: PieceDamage[] = chain.pieces.map(() => ({ permanentTwist: 0, maxShearStrain: 0, broken: false }));
  chain.elements.forEach((el, e) => {
    const law = laws[e];
    if (!(law instanceof PlasticElementLaw)) {
      for (const i of el.pieces) {
        out[i].maxShearStrain = Math.max(out[i].maxShearStrain, elasticStrain(i));
        if (law instanceof ShearPinLaw && law.kind === 'shaft' && law.isParted) out[i].broken = true;
      }
      return;
    }
    const b = law.backbone;
    const rates = b.pieceTwistRates(law.peakTwist);
    // The backbone's pieces are the element's pieces of positive length, in order.
    const inside = el.pieces.filter((i) => Math.min(el.end, chain.pieces[i].piece.end) - Math.max(el.start, chain.pieces[i].piece.start) > 0);
    inside.forEach((i, k) => {
      const { law: tl, length } = b.pieces[k];
      const rate = law.yielded || !piecePeak ? rates[k] : piecePeak[i] / rigidity(tl);
      out[i].maxShearStrain = Math.max(out[i].maxShearStrain, tl.outerRadius * rate);
      if (law.broken && k === b.firstToBreak) out[i].broken = true;
      else if (law.yielded) out[i].permanentTwist += length * residualTwistRate(tl, rates[k]);
    });
  });
  return out;
}
