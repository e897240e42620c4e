import type { SideName } from '../model/shaft-model.ts';
import type { Results } from '../results/results.ts';
import { dynamicLimitersSlip, type RunPeak, type StopWave } from './dynamic-limiter-slip.ts';

export type SlipMethod = 'energy method' | 'dynamic model';

/** What a torque limiter set at `setting` does in a repeat of the incident. */
export interface LimiterSlip {
  /** The limiter's slip torque, N·m. */
  setting: number;
  /** Repeat-incident peak torque in the run between the limiter and the stop, N·m. */
  peakTorque: number;
  /** The incident's peak torque without the limiter, N·m. */
  unlimitedTorque: number;
  /** Kinetic energy of the parts behind the limiter, J. */
  energy: number;
  /**
   * Energy method: energy stored in the twisted run at the peak, J. Dynamic model: energy left in
   * the model (kinetic and elastic) at the end of the simulated window, J.
   */
  storedEnergy: number;
  /** Energy the limiter dissipates while it slips, J. */
  slipEnergy: number;
  /** Angle the limiter slips through, rad. */
  slipAngle: number;
  /** Which method gave the slip energy, angle and peak torque. */
  slipMethod: SlipMethod;
  /** How, in words. */
  method: string;
  /** Dynamic model: the segment (index into `shaft.segments`) the limiter was put in. */
  segment?: number;
  /** Dynamic model: the ends of the piece of that segment that held the limiter, m (the segment cut at the limiter's station). */
  modelledFrom?: number;
  modelledTo?: number;
  /** Dynamic model: the case already had a limiter on the run, and it was reset rather than one added at the station. */
  modelledInExisting?: boolean;
  /** Dynamic model: the limited side's highest stress / shear yield in the rerun. */
  yieldRatio?: number;
  /** Dynamic model: the peak torque of each piece from the limiter to the stop in the rerun. */
  runPeaks?: RunPeak[];
  /** Dynamic model: energy its damping took in the rerun, J. */
  dampingWork?: number;
  /** Why the energy method was kept where the verdict stands on the dynamic model. */
  note?: string;
  /** Dynamic model, instantaneous stop, peak well above the setting: the stop's own stress wave that explains it. */
  stopWave?: StopWave;
}

/**
 * The energy method for a limiter between the parts and the stop (REFERENCE 10.11, derived): the run
 * of compliance C twists elastically up to the slip torque T_s, storing T_s²C/2; the rest of the
 * parts' energy E − T_s²C/2 is dissipated in slip, through an angle (E − T_s²C/2)/T_s. A setting at
 * or above the unlimited peak √(2E/C) never slips.
 */
export function energyMethodSlip(energy: number, compliance: number, setting: number, unlimitedTorque = Math.sqrt((2 * energy) / compliance)) {
  if (setting >= unlimitedTorque) {
    return { peakTorque: unlimitedTorque, storedEnergy: 0.5 * unlimitedTorque ** 2 * compliance, slipEnergy: 0, slipAngle: 0, unlimitedTorque };
  }
  const storedEnergy = 0.5 * setting ** 2 * compliance;
  const slipEnergy = Math.max(0, energy - storedEnergy);
  return { peakTorque: setting, storedEnergy, slipEnergy, slipAngle: slipEnergy / setting, unlimitedTorque };
}

/** Where a limiter sits: its station and the side of the stop whose parts drive through it. */
export interface LimiterPlace {
  station: string;
  side: SideName;
}

/**
 * A limiter's slip in a repeat incident. Where the case's verdict stands on the dynamic model
 * (a drive, belt, stop ramp, several masses), the limiter is put into the case as a slip element
 * and the changed case rerun (`dynamicLimiterSlip`); where the energy method is exact, or
 * `energyOnly` is asked (the report's sweep), the energy method. When the shaft beside the
 * limiter's station cannot hold a limiter (a shear pin is there), the energy method is kept and `note` says so.
 */
export function limiterSlip(r: Results, place: LimiterPlace, setting: number, energyOnly = false): LimiterSlip {
  if (energyOnly || r.verdictBasis !== 'dynamic model') return energyLimiterSlip(r, place, setting);
  const unlimited = r.dynamic.sides.find((s) => s.side === place.side)?.dynamicPeakTorque;
  return limitersSlip(r, [{ ...place, setting }], () => unlimited)[0];
}

/** The case and its energy method per side, with the model the verdict stands on: what a limiter's slip reads. */
export type SlipBasis = Pick<Results, 'case' | 'sides' | 'verdictBasis'>;

/**
 * Several limiters (one a side of the stop) in a repeat of the incident, each as `limiterSlip` takes
 * one: by the energy method per side, or, where the verdict stands on the dynamic model, all put
 * into the case together and the changed case rerun once (`dynamicLimitersSlip`). `unlimited`
 * gives a side's incident peak without a limiter by the dynamic model where it is known (else the
 * energy method's is shown).
 */
export function limitersSlip(r: SlipBasis, places: readonly (LimiterPlace & { setting: number })[], unlimited: (side: SideName) => number | undefined): LimiterSlip[] {
  const energy = places.map((p) => energyLimiterSlip(r, p, p.setting));
  if (r.verdictBasis !== 'dynamic model') return energy;
  const d = dynamicLimitersSlip(r.case, places);
  if (!d) {
    return energy.map((e, i) => ({
      ...e,
      note: `The shaft beside "${places[i].station}" toward the stop cannot hold a limiter in the model (a shear pin is there), so the slip is the energy method's although the verdict stands on the dynamic model.`,
    }));
  }
  return d.map((x, i) => {
    const seg = r.case.shaft.segments[x.segment];
    return {
      setting: places[i].setting,
      energy: energy[i].energy,
      unlimitedTorque: unlimited(places[i].side) ?? energy[i].unlimitedTorque,
      peakTorque: x.peakTorque,
      storedEnergy: x.energyLeft,
      slipEnergy: x.slipEnergy,
      slipAngle: x.slipAngle,
      slipMethod: 'dynamic model',
      method: `dynamic model: the limiter put into ${seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}`} beside "${places[i].station}" as a slip element and the changed case rerun in time`,
      segment: x.segment,
      modelledFrom: x.from,
      modelledTo: x.to,
      modelledInExisting: x.existing,
      yieldRatio: x.yieldRatio,
      runPeaks: x.runPeaks,
      dampingWork: x.dampingWork,
      ...(x.stopWave ? { stopWave: x.stopWave } : {}),
    };
  });
}

/** The energy method's limiter slip. Parts nearer the stop than the limiter still drive the shaft unlimited; their energy is not the limiter's. */
export function energyLimiterSlip(r: Pick<Results, 'case' | 'sides'>, place: LimiterPlace, setting: number): LimiterSlip {
  const side = r.sides.find((s) => s.side === place.side)!;
  const stations = r.case.stations;
  const stop = stations.find((s) => s.name === r.case.stop.at)!;
  const at = stations.find((s) => s.name === place.station)!;
  const reach = Math.abs(at.at - stop.at) - 1e-9;
  const behind = side.parts.filter((p) => Math.abs(stations.find((s) => s.name === p.station)!.at - stop.at) >= reach);
  const energy = behind.reduce((sum, p) => sum + p.kineticEnergy, 0);
  const compliance = side.pieces.filter((p) => Math.max(Math.abs(p.piece.start - stop.at), Math.abs(p.piece.end - stop.at)) <= reach + 2e-9).reduce((sum, p) => sum + p.twist / p.torque, 0);
  const slip = energyMethodSlip(energy, compliance, setting, side.peakTorque);
  return { setting, energy, ...slip, slipMethod: 'energy method', method: 'energy method: elastic twist up to the slip torque, the rest dissipated in slip' };
}
