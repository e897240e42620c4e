import type { SideName } from '../model/shaft-model.ts';
import type { Results } from '../results/results.ts';

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
  /** Energy stored in the twisted run at the peak, J. */
  storedEnergy: number;
  /** Energy the limiter dissipates while it slips, J. */
  slipEnergy: number;
  /** Angle the limiter slips through, rad. */
  slipAngle: number;
  method: string;
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
 * A limiter's slip in a repeat incident. This is the seam for the dynamics model: when Results
 * carries a time-domain result, its slip energy and angle replace the energy method here, and
 * nothing that calls this function changes. Parts at stations nearer the stop than the limiter
 * still drive the shaft unlimited; their energy is not counted as the limiter's.
 */
export function limiterSlip(r: Results, place: LimiterPlace, setting: number): LimiterSlip {
  const side = r.sides.find((s) => s.side === place.side)!;
  const stations = r.case.stations;
  const stop = stations.find((s) => s.name === r.case.stop.at)!;
  const at = stations.find((s) => s.name === place.station)!;
  const reach = Math.abs(at.at - stop.at) - 1e-9;
  const behind = side.parts.filter((p) => Math.abs(stations.find((s) => s.name === p.station)!.at - stop.at) >= reach);
  const energy = behind.reduce((sum, p) => sum + p.kineticEnergy, 0);
  const compliance = side.pieces
    .filter((p) => Math.max(Math.abs(p.piece.start - stop.at), Math.abs(p.piece.end - stop.at)) <= reach + 2e-9)
    .reduce((sum, p) => sum + p.twist / p.torque, 0);
  const slip = energyMethodSlip(energy, compliance, setting, side.peakTorque);
  return { setting, energy, ...slip, method: 'energy method: elastic twist up to the slip torque, the rest dissipated in slip' };
}
