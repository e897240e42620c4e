import type { Case } from '../case/case.ts';
import type { ChainElement, ChainSpring } from '../model/chain.ts';

/**
 * The dampers of the dynamic model, one per spring of an element: each spring (a length of shaft,
 * a coupling) carries a dashpot proportional to its own stiffness, c_i = β_i·k_i, with
 * β_i = 2ζ_i/ω₁ so that the spring alone, holding all of a side's strain energy, would give that
 * side's lowest mode the damping ratio ζ_i (stiffness-proportional Rayleigh damping, Clough &
 * Penzien, Dynamics of Structures, Sec. 12-4; from memory, confident). ζ_i is the coupling's
 * `damping_ratio` from its data sheet, the segment's own `damping_ratio` for its shaft, else
 * `analysis.damping_ratio`.
 *
 * The springs of an element are in series with no inertia between them, so they carry one
 * torque T and each twists by T/k_i (to first order in the damping). Each dashpot then dissipates
 * c_i·(Ṫ/k_i)² = β_i·C_i·Ṫ², and one dashpot across the whole element, c_e·(Ṫ/k_e)², dissipates
 * the same when
 *
 *   c_e = k_e²·Σ β_i·C_i   (C_i = 1/k_i, k_e = 1/Σ C_i),
 *
 * which is what the integrator steps; the element's dissipated energy is shared among its springs
 * in the ratio β_i·C_i, i.e. ζ_i·C_i, at every instant. With every ζ_i equal this is the single
 * ratio of before, c_e = (2ζ/ω₁)·k_e. The lowest mode's damping ratio is then the strain-energy
 * weighted mean Σ ζ_i·U_i / Σ U_i (the modal form of Rayleigh damping; derived here, checked in
 * test/results/element-damping.test.ts against a two-spring ring-down).
 */
export function springDampingRatio(c: Case, s: ChainSpring): number {
  const own = s.kind === 'coupling' ? s.segment.coupling?.dampingRatio : s.segment.dampingRatio;
  return own ?? c.analysis.dampingRatio;
}

/** Each spring's share of the energy its element's dashpot dissipates: ζ_i·C_i / Σ ζ_j·C_j (all 0 where none is damped). */
export function dampingShares(c: Case, el: ChainElement): number[] {
  const w = el.springs.map((s) => springDampingRatio(c, s) * s.compliance);
  const sum = w.reduce((a, b) => a + b, 0);
  return w.map((x) => (sum > 0 ? x / sum : 0));
}

/** The element's dashpot at its elastic stiffness, N·m·s/rad: k_e²·Σ (2ζ_i/ω₁)·C_i; 0 where ω₁ is unknown. */
export function elementDashpot(c: Case, el: ChainElement, omega1: number | undefined): number {
  if (!omega1) return 0;
  const k = el.stiffness;
  const ratios = el.springs.map((s) => springDampingRatio(c, s));
  // One ratio throughout: (2ζ/ω₁)·k_e, exactly as with a single ratio (no rounding from the sum).
  if (ratios.every((z) => z === ratios[0])) return ((2 * ratios[0]) / omega1) * k;
  return ((k * k * 2) / omega1) * el.springs.reduce((sum, s) => sum + springDampingRatio(c, s) * s.compliance, 0);
}

/** The smallest damping ratio of any spring in the chain (the integrator keeps its fine step throughout where it is 0). */
export function leastDampingRatio(c: Case, elements: readonly ChainElement[]): number {
  return Math.min(c.analysis.dampingRatio, ...elements.flatMap((el) => el.springs.map((s) => springDampingRatio(c, s))));
}
