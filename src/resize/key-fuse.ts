import type { Case, Segment, ShaftKey } from '../case/case.ts';
import type { Material } from '../materials/material.ts';
import { keyBearingStress, keyShearStress } from '../physics/key-stress.ts';
import { shearUltimate, shearYield } from '../physics/shear-strength.ts';
import type { Results } from '../results/results.ts';
import type { RunningTorque } from '../results/running-torque.ts';
import { runToStop, shaftRun, weakestPiece } from './shaft-run.ts';

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
 * torque. Stresses from Shigley 9th ed. Sec. 7-7 (src/physics/key-stress.ts). The torque through a
 * key is the peak torque of the side its station is on (the energy method does not split a side's
 * torque between its stations); a key at the stop takes both sides' peaks together, an upper bound.
 */
export function keyFuses(c: Case, r: Results, limiter?: LimiterSetting, running?: RunningTorque): KeyFuse[] {
  return c.stations.filter((s) => s.key).map((s) => keyFuse(c, r, s.name, limiter, running));
}

/** A torque limiter's place and highest setting, as the key check needs them. */
export interface LimiterSetting {
  station: string;
  setting: number;
  /** The limited side's incident peak torque, N·m. */
  sidePeakTorque: number;
}

function keyFuse(c: Case, r: Results, station: string, limiter?: LimiterSetting, running?: RunningTorque): KeyFuse {
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

  const incidentTorque = torqueThrough(c, r, s.at, stop.at);
  const shearOff = material.tensileStrength !== undefined ? shearUltimate(material.tensileStrength) : tauY;
  const shearOffBasis =
    material.tensileStrength !== undefined ? 'taking its ultimate shear strength as 0.67·Sut, Shigley 9th ed. Sec. 6-15' : 'taking its shear yield, as the key material has no tensile strength';
  const shearOffTorque = shearOff / keyShearStress(1, d, key.width, key.length);
  const crushTorque = material.yieldStrength! / keyBearingStress(1, d, key.height, key.length, key.hubDepth);
  const run = s.at === stop.at ? loadedRun(c, r) : runToStop(c, station);
  const shaftYieldTorque = weakestPiece(run)?.yieldTorque ?? Infinity;

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

/** The incident torque the shaft carries at position `at`. */
function torqueThrough(c: Case, r: Results, at: number, stopAt: number): number {
  if (Math.abs(at - stopAt) <= 1e-9) return r.sides.reduce((sum, s) => sum + s.peakTorque, 0);
  const side = r.sides.find((s) => s.side === (at < stopAt ? 'A' : 'B'));
  if (!side) return 0;
  const far = Math.max(...side.stations.map((n) => Math.abs(c.stations.find((x) => x.name === n)!.at - stopAt)));
  return Math.abs(at - stopAt) <= far + 1e-9 ? side.peakTorque : 0;
}

/** The whole loaded run, both sides (for a key at the stop). */
function loadedRun(c: Case, r: Results) {
  const ends = r.sides.flatMap((s) => s.pieces.flatMap((p) => [p.piece.start, p.piece.end]));
  return shaftRun(c, Math.min(...ends), Math.max(...ends));
}
