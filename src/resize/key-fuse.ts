import type { Case, Segment, ShaftKey } from '../case/case.ts';
import type { Material } from '../materials/material.ts';
import type { Investigation } from '../finding/investigation.ts';
import { keyBearingStress, keyShearStress } from '../physics/key-stress.ts';
import { shearYield } from '../physics/shear-strength.ts';
import type { RunningTorque } from '../results/running-torque.ts';

/** A key's stresses under one torque. */
export interface KeyStress {
  torque: number;
  /** τ = 2T/(d·w·l), Pa. */
  shearStress: number;
  /** σ = 4T/(d·h·l) (h/2 rule) or 2T/(d·h_hub·l), Pa. */
  bearingStress: number;
  /** τ / the key's shear yield. */
  shearRatio: number;
  /** σ / the key's tensile yield. */
  bearingRatio: number;
}

/** The key as a fuse: does it shear before the shaft yields? */
export interface KeyFuse {
  station: string;
  key: ShaftKey;
  material: Material;
  /** The segment the key sits in; its diameter is the key's shaft diameter. */
  segment: Segment;
  incident: KeyStress;
  /** Under the torque limiter's highest setting, where the key is in the limited run. */
  atLimiter?: KeyStress;
  /** Under the running torque, where the key carries it; with the factor to the first of shear and crushing yield. */
  atRunning?: KeyStress & { factor: number };
  /** Torque at which the key shears off, N·m. */
  shearOffTorque: number;
  /** The strength used for shearing off, in words. */
  shearOffBasis: string;
  /** Torque at which the key's side face reaches its yield in bearing, N·m. */
  crushTorque: number;
  /** Torque at which the shaft between the key and the stop first yields (with kt), N·m. */
  shaftYieldTorque: number;
  shearsBeforeShaftYields: boolean;
  notes: string[];
}

/**
 * Every key in the case, checked under the incident torque, the limiter's setting and the running
 * torque. Stresses from Shigley 9th ed. Sec. 7-7 (src/physics/key-stress.ts). The incident torque
 * through a key is the one the finding's drive train gives it (`Finding.driveTrain`, the verdict's
 * model through `Results.keys`: the dynamic model's peak as carried, or the energy method's side
 * peak), so `check` and `resize` judge the key at one torque; its shear-off, crushing and the
 * shaft's yield torque are those of the same check (src/results/key-checks.ts).
 */
export function keyFuses(c: Case, r: Investigation, limiter?: LimiterSetting, running?: RunningTorque): KeyFuse[] {
  return c.stations.filter((s) => s.key).map((s) => keyFuse(c, r, s.name, limiter, running));
}

/** A torque limiter's place and highest setting, as the key check needs them. */
export interface LimiterSetting {
  station: string;
  setting: number;
  /** The limited side's incident peak torque by the finding's model, N·m. */
  sidePeakTorque: number;
}

function keyFuse(c: Case, r: Investigation, station: string, limiter?: LimiterSetting, running?: RunningTorque): KeyFuse {
  const s = c.stations.find((x) => x.name === station)!;
  const stop = c.stations.find((x) => x.name === c.stop.at)!;
  const key = s.key!;
  const material = c.materials[key.material];
  const segment = segmentAt(c, s.at, stop.at);
  const d = segment.diameter;
  const tauY = shearYield(material.yieldStrength!, c.analysis.criterion);
  const stress = (torque: number): KeyStress => {
    const shear = keyShearStress(torque, d, key.width, key.length);
    const bearing = keyBearingStress(torque, d, key.height, key.length, key.hubDepth);
    return { torque, shearStress: shear, bearingStress: bearing, shearRatio: shear / tauY, bearingRatio: bearing / material.yieldStrength! };
  };

  const check = r.keys.find((k) => k.station === station)!;
  const element = r.finding.driveTrain.find((e) => e.kind === 'key' && e.where === station);
  const incidentTorque = element?.torque ?? check.torque;
  const { shearOffTorque, crushTorque, shaftYieldTorque } = check;
  const shearOffBasis =
    material.tensileStrength !== undefined ? 'taking its ultimate shear strength as 0.67·Sut, Shigley 9th ed. Sec. 6-15' : 'taking its shear yield, as the key material has no tensile strength';

  const out: KeyFuse = {
    station,
    key,
    material,
    segment,
    incident: stress(incidentTorque),
    shearOffTorque,
    shearOffBasis,
    crushTorque,
    shaftYieldTorque,
    shearsBeforeShaftYields: shearOffTorque < shaftYieldTorque,
    notes: [],
  };
  if (limiter && between(c, s.at, limiter.station, stop.at)) {
    // At the stop the other side's torque still arrives unlimited.
    const limited = Math.min(limiter.setting, limiter.sidePeakTorque);
    out.atLimiter = stress(Math.abs(s.at - stop.at) <= 1e-9 ? incidentTorque - limiter.sidePeakTorque + limited : Math.min(limiter.setting, incidentTorque));
  }
  if (running && between(c, s.at, running.station, stop.at)) {
    const k = stress(running.torque);
    out.atRunning = { ...k, factor: 1 / Math.max(k.shearRatio, k.bearingRatio) };
  }
  if (key.length > 1.5 * d) out.notes.push(`The key is longer than 1.5 times the shaft's diameter; Shigley (9th ed. p. 391) advises against it, as the shaft's twist loads such a key unevenly.`);
  if (crushTorque < shearOffTorque) out.notes.push('The key yields in bearing (its side faces crush and roll over) at a lower torque than it shears: it deforms rather than cleanly fusing.');
  return out;
}

/** The segment a station's hub sits on; on a boundary, the one toward the stop (the torque's way). */
function segmentAt(c: Case, at: number, stopAt: number): Segment {
  const probe = at + Math.sign(stopAt - at) * 1e-7;
  return c.shaft.segments.find((g) => g.start <= probe && probe <= g.end) ?? c.shaft.segments[c.shaft.segments.length - 1];
}

/** Whether position `at` lies on the way from the named station to the stop, both ends included. */
function between(c: Case, at: number, station: string, stopAt: number): boolean {
  const from = c.stations.find((x) => x.name === station)!.at;
  return Math.min(from, stopAt) - 1e-9 <= at && at <= Math.max(from, stopAt) + 1e-9;
}
