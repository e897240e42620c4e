import type { Case } from '../case/case.ts';
import type { Chain } from '../model/chain.ts';
import { PlasticElementLaw } from '../physics/plastic-element-law.ts';
import { residualTwistRate } from '../physics/plastic-torsion.ts';
import { sectionTwistRate } from '../physics/series-backbone.ts';
import type { TorqueLaw } from '../physics/torque-law.ts';
import { segmentLaw } from './side-balance.ts';

/**
 * Permanent twist of each piece after the incident, rad: elastic unloading from the largest torque
 * each of its elements carried (by Masing's rule always a point of first loading), φ_p = φ − T/GJ_p
 * per length (shared REFERENCE 3.1.6, `residualTwistRate`), over the part of the piece in the
 * element. Zero for pieces that stayed elastic or whose elements are elastic laws.
 */
export function dynamicPermanentTwist(c: Case, chain: Chain, laws: readonly TorqueLaw[]): number[] {
  const out = chain.pieces.map(() => 0);
  chain.elements.forEach((el, e) => {
    const law = laws[e];
    if (!(law instanceof PlasticElementLaw) || !law.yielded) return;
    for (const i of el.pieces) {
      const p = chain.pieces[i].piece;
      const tl = segmentLaw(c, p.segment);
      if (!tl) continue;
      const length = Math.min(el.end, p.end) - Math.max(el.start, p.start);
      out[i] += length * residualTwistRate(tl, sectionTwistRate(tl, law.peakTorque));
    }
  });
  return out;
}
