import type { Case } from '../case/case.ts';
import { seatSegment } from '../model/hub-seat.ts';
import type { SideResult } from '../physics/energy-method.ts';
import { keyBearingStress, keyShearStress } from '../physics/key-stress.ts';
import { shearUltimate, shearYield } from '../physics/shear-strength.ts';
import type { DynamicResult } from './dynamic-result.ts';
import { hubTorque, shaftYieldTorqueToStop } from './hub-torque.ts';
import type { VerdictBasis } from './verdict-basis.ts';

/** A station's key checked at the incident torque. */
export interface KeyCheck {
  station: string;
  /** The shaft's diameter at the key, m. */
  shaftDiameter: number;
  /** Peak torque through the hub in the incident, N·m, and whether that is an upper bound. */
  torque: number;
  upperBound: boolean;
  /** τ = 2T/(d·w·l) and σ = 4T/(d·h·l) (or 2T/(d·h_hub·l)) at that torque, Pa (Shigley 9th ed. Sec. 7-7). */
  shearStress: number;
  bearingStress: number;
  /** The key's shear yield by the case's criterion, Pa, and in words. */
  shearYield: number;
  shearYieldBasis: string;
  /** τ over the key's shear yield; σ over the key's tensile yield. */
  shearRatio: number;
  bearingRatio: number;
  /** Torque at which the key shears off, N·m, and the strength that takes, in words. */
  shearOffTorque: number;
  shearOffBasis: string;
  /** Torque at which the key's side face reaches its yield in bearing (crushes, rolls over), N·m. */
  crushTorque: number;
  /** Torque at which the shaft between the key and the stop first yields (kt applied), N·m. */
  shaftYieldTorque: number;
}

/**
 * Every key in the case at the incident's torque by the verdict's model. Shearing off takes the
 * key's ultimate shear strength, S_su ≈ 0.67·S_ut (Shigley 9th ed. Sec. 6-15; from memory,
 * confident), or its shear yield where its material has no tensile strength; the shear ratio is
 * against the shear yield of the case's criterion (distortion energy S_y/√3, or 0.5·S_y).
 */
export function keyChecks(c: Case, basis: VerdictBasis, sides: readonly SideResult[], dynamic: DynamicResult): KeyCheck[] {
  const stopAt = c.stations.find((x) => x.name === c.stop.at)!.at;
  return c.stations
    .filter((s) => s.key)
    .map((s) => {
      const key = s.key!;
      const m = c.materials[key.material];
      const d = seatSegment(c.shaft.segments, s.at, stopAt).diameter;
      const through = hubTorque(c, s, basis, sides, dynamic);
      const tauY = shearYield(m.yieldStrength!, c.analysis.criterion);
      const shear = keyShearStress(through.torque, d, key.width, key.length);
      const bearing = keyBearingStress(through.torque, d, key.height, key.length, key.hubDepth);
      const ultimate = m.tensileStrength !== undefined;
      return {
        station: s.name,
        shaftDiameter: d,
        torque: through.torque,
        upperBound: through.upperBound,
        shearStress: shear,
        bearingStress: bearing,
        shearYield: tauY,
        shearYieldBasis: c.analysis.criterion === 'max-shear' ? 'shear yield 0.5·Sy (maximum shear)' : 'shear yield Sy/√3 (distortion energy)',
        shearRatio: shear / tauY,
        bearingRatio: bearing / m.yieldStrength!,
        shearOffTorque: (ultimate ? shearUltimate(m.tensileStrength!) : tauY) / keyShearStress(1, d, key.width, key.length),
        shearOffBasis: ultimate ? 'ultimate shear strength 0.67·Sut (Shigley 9th ed. Sec. 6-15)' : 'shear yield (the key material has no tensile strength)',
        crushTorque: m.yieldStrength! / keyBearingStress(1, d, key.height, key.length, key.hubDepth),
        shaftYieldTorque: shaftYieldTorqueToStop(c, s),
      };
    });
}
