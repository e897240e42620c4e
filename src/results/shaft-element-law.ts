import type { Case } from '../case/case.ts';
import type { Chain, ChainElement } from '../model/chain.ts';
import { brittleFractureShear, fractureShearStrain, isBrittle } from '../physics/fracture.ts';
import { PlasticElementLaw } from '../physics/plastic/plastic-element-law.ts';
import { SeriesBackbone, type SeriesPiece } from '../physics/plastic/series-backbone.ts';
import { ShearPinLaw } from '../physics/shear-pin-law.ts';
import type { TorqueLaw } from '../physics/torque-law.ts';
import { shearStress } from '../physics/torsion.ts';
import { pieceLaw } from './side-balance.ts';

/**
 * The law of a plain shaft element of the chain when its shaft may yield and break, from the
 * pieces it spans (each piece's overlap with the element), as the energy balance takes them
 * (`sideBalance`): ductile pieces elastic–plastic on the net section, breaking at their fracture
 * shear strain; an element with a brittle piece elastic up to that piece's fracture torque
 * (K_t applied), then parted. Undefined where a material lacks what the law needs (the element
 * then stays elastic).
 */
export function shaftElementLaw(c: Case, chain: Chain, el: ChainElement, initialTwist: number): TorqueLaw | undefined {
  const parts: SeriesPiece[] = [];
  let brittleTorque = Infinity;
  for (const i of el.pieces) {
    const seg = chain.pieces[i].piece.segment;
    const m = c.materials[seg.material];
    const p = chain.pieces[i].piece;
    const length = Math.min(el.end, p.end) - Math.max(el.start, p.start);
    if (!(length > 0)) continue;
    if (isBrittle(m)) {
      if (m.tensileStrength === undefined && m.yieldStrength === undefined) return undefined;
      brittleTorque = Math.min(brittleTorque, brittleFractureShear(m, seg.kt) / shearStress(1, seg.diameter, seg.bore));
      continue;
    }
    const law = pieceLaw(c, p);
    if (!law) return undefined;
    const fs = fractureShearStrain(m);
    parts.push({ law, length, fractureTwistRate: fs ? fs.value / law.outerRadius : Infinity });
  }
  // A brittle piece governs its element: it breaks before a ductile neighbour in the same element
  // yields enough to matter (the element's other pieces are then taken as elastic).
  if (Number.isFinite(brittleTorque)) return new ShearPinLaw(el.stiffness, brittleTorque, 'shaft');
  return parts.length > 0 ? new PlasticElementLaw(new SeriesBackbone(parts, el.stiffness), initialTwist) : undefined;
}
