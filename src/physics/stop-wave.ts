import { polarMoment } from './torsion.ts';

/**
 * Torque of the torsional stress wave that a sudden change of speed Δω at a section sends along a
 * uniform round shaft: T = Δω·J_p·√(G·ρ), the jump in speed times the shaft's torsional impedance
 * J_p·√(G·ρ) = ρ·J_p·c, with c = √(G/ρ) the speed of torsional waves (the wave equation
 * ρ·J_p·θ̈ = G·J_p·θ'' behind shared REFERENCE 2.8, whose travelling wave θ(x − ct) has
 * T = G·J_p·θ' = −J_p·√(G·ρ)·θ̇; Kolsky, Stress Waves in Solids, 1963, the chapter on waves in
 * bars; from memory, confident, chapter to verify). An instantaneous stop puts this torque on top of the running torque in the shaft next to
 * the stop, before any reflection returns and before a limiter farther along can slip. In a lumped
 * chain of equal elements (k = G·J_p/L, node inertia ρ·J_p·L) it is ω·√(k·J): √(k·J) = J_p·√(G·ρ)
 * whatever L is, so splitting the shaft finer does not take it away.
 */
export function stopWaveTorque(speedJump: number, shearModulus: number, density: number, d: number, di = 0): number {
  return Math.abs(speedJump) * polarMoment(d, di) * Math.sqrt(shearModulus * density);
}
