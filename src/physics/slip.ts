import type { BeltSpec } from '../case/case.ts';

// Belt slip by the capstan (Euler–Eytelwein) relation. Shigley's Mechanical Engineering Design
// 9th ed., Sec. 17-2 (flat belts) and 17-3 (V-belts); from memory, confident.

/**
 * Limiting tension ratio F1/F2 = e^(μ_eff·φ) of a belt on the point of slipping, with wrap φ (rad).
 * For a V-belt the wedge raises the friction to μ_eff = μ/sin(β/2), β the groove's included angle.
 */
export function tensionRatio(friction: number, wrapAngle: number, grooveAngle?: number): number {
  return Math.exp(effectiveFriction(friction, grooveAngle) * wrapAngle);
}

/** μ/sin(β/2) for a V-groove of included angle β, or μ for a flat belt. */
export function effectiveFriction(friction: number, grooveAngle?: number): number {
  return grooveAngle === undefined ? friction : friction / Math.sin(grooveAngle / 2);
}

/** Slip torque at a pulley of radius r from the tight-side tension: (F1 − F2)·r = F1·(1 − 1/ratio)·r, N·m. */
export function slipTorqueFromTightSide(tightSide: number, ratio: number, radius: number): number {
  return tightSide * (1 - 1 / ratio) * radius;
}

/**
 * Slip torque at a pulley of radius r from the installed tension F_i, taking F1 + F2 = 2F_i
 * (centrifugal tension neglected): F1 − F2 = 2F_i·(ratio − 1)/(ratio + 1), N·m.
 */
export function slipTorqueFromInstalled(installed: number, ratio: number, radius: number): number {
  return ((2 * installed * (ratio - 1)) / (ratio + 1)) * radius;
}

/** Coulomb friction torque opposing a relative speed: −T·sign(speed); 0 at rest (the stick case decides there). */
export function coulombTorque(capacity: number, relativeSpeed: number): number {
  return relativeSpeed > 0 ? -capacity : relativeSpeed < 0 ? capacity : 0;
}

/** A belt's slip torque at this station's shaft, and the capstan working when it came from belt data. */
export interface BeltSlip {
  /** N·m at the shaft of the station the belt drives. */
  slipTorque: number;
  capstan?: {
    effectiveFriction: number;
    /** F1/F2 at the point of slipping. */
    tensionRatio: number;
    /** Tight- and slack-side tensions at the point of slipping, N. */
    tightSide: number;
    slackSide: number;
    /** Radius of the pulley on this shaft, m. */
    radius: number;
  };
}

/** The slip torque a belt spec gives: stated, or from the capstan relation (8.1, 8.2, 8.5 of the shared reference). */
export function beltSlip(spec: BeltSpec): BeltSlip {
  if (spec.kind === 'slip torque') return { slipTorque: spec.slipTorque };
  const ratio = tensionRatio(spec.friction, spec.wrapAngle, spec.grooveAngle);
  const radius = spec.pulleyDiameter / 2;
  const tightSide = spec.tensionIs === 'tight side' ? spec.tension : (2 * spec.tension * ratio) / (ratio + 1);
  const slipTorque = spec.tensionIs === 'tight side' ? slipTorqueFromTightSide(tightSide, ratio, radius) : slipTorqueFromInstalled(spec.tension, ratio, radius);
  return {
    slipTorque,
    capstan: { effectiveFriction: effectiveFriction(spec.friction, spec.grooveAngle), tensionRatio: ratio, tightSide, slackSide: tightSide / ratio, radius },
  };
}
