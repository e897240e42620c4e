import { normalCdf } from './normal-cdf.ts';

/** The chance that a model's stress / shear yield reaches 1 under the case's tolerances. */
export interface ChanceEstimate {
  /** Point estimate, clipped to [0, 1]. */
  probability: number;
  /** 95 % interval, within [0, 1]; always holds `probability`. */
  interval: [number, number];
  /** How it was estimated: the share of the model's own runs, or that share corrected by a cheap model's (see `controlVariateChance`). */
  method: 'monte-carlo' | 'control-variates';
  /** Full runs of the model the chance is for. */
  runs: number;
  /** Cheap energy-method samples used as the control (control-variates only). */
  controlSamples?: number;
}

/** Two-sided 95 % quantile of the standard normal. */
const Z95 = 1.959963984540054;

/**
 * The Wilson score interval for a share `p` observed in `n` trials (Wilson, "Probable inference,
 * the law of succession, and statistical inference", JASA 22, 1927, 209–212; recommended over the
 * normal "p ± z·√(p(1−p)/n)" interval by Agresti & Coull, The American Statistician 52, 1998,
 * 119–126; both from memory). Unlike that interval it is never empty at 0 or 1: 0 of n gives
 * [0, z²/(n + z²)], so 0 of 10 000 gives [0, 3.84e-4]. `n` may be an effective sample size (not a
 * whole number). Within [0, 1].
 */
export function wilsonInterval(p: number, n: number, z = Z95): [number, number] {
  if (!(n > 0)) return [0, 1];
  const z2n = (z * z) / n;
  const centre = (p + z2n / 2) / (1 + z2n);
  const half = (z * Math.sqrt((p * (1 - p)) / n + z2n / (4 * n))) / (1 + z2n);
  return [p <= 0 ? 0 : Math.max(0, centre - half), p >= 1 ? 1 : Math.min(1, centre + half)];
}

/** The plain Monte Carlo chance: the share of `ratios` at 1 or more, with its Wilson interval. None: [0, 1]. */
export function monteCarloChance(ratios: ArrayLike<number>): ChanceEstimate {
  const n = ratios.length;
  let hits = 0;
  for (let i = 0; i < n; i++) if (ratios[i] >= 1) hits++;
  const p = n > 0 ? hits / n : 0;
  return { probability: p, interval: wilsonInterval(p, n), method: 'monte-carlo', runs: n };
}

/**
 * The chance that the expensive model's ratio reaches 1, from its `fine` runs helped by a cheap
 * model's `coarse` samples, of which the first `fine.length` are the same draws (same seed) and the
 * rest are extra. Two-phase sampling with a control variate (Glasserman, Monte Carlo Methods in
 * Financial Engineering, 2004, §4.1; the same estimator is Cochran's "double sampling for
 * regression", Sampling Techniques, 3rd ed., 1977, ch. 12; both from memory):
 *
 * 1. On the M pairs fit ln Y_fine = a + b·ln Y_coarse by least squares; s is the residual spread.
 * 2. The control is the chance the fitted relation gives each cheap sample of reaching 1:
 *    g = Φ((a + b·ln Y_coarse)/s) (a smoothed indicator; the hard one [fit ≥ 1] where s = 0). It
 *    costs nothing for all N samples and follows the fine indicator I = [Y_fine ≥ 1] more closely
 *    than the hard [fit ≥ 1] does, so the correction removes more of the variance.
 * 3. p = mean_M(I) − β·(mean_M(g) − mean_N(g)), β = cov_M(I, g)/var_M(g). For a fixed β its
 *    variance is var_M(I − β·(1 − M/N)·g)/M + β²·(1 − M/N)²·var_R(g)/(N − M), R the N − M extra
 *    samples (mean_N(g) = (M/N)·mean_M(g) + (1 − M/N)·mean_R(g), the two parts independent).
 * 4. The 95 % interval is Wilson's at p with the effective sample size p(1 − p)/variance (the
 *    plain runs that would be as sure; at most N, the cheap samples' own limit; after Korn &
 *    Graubard, Survey Methodology 24, 1998, from memory), so it stays within [0, 1] and asymmetric
 *    near the ends.
 * 5. Where the M fine runs all agree (none or every one reaches 1), their spread says nothing of how
 *    far the control can be trusted: the interval is Wilson's from the M runs alone (0 of 40 gives
 *    [0, 8.8 %]), and the point is the fitted relation's chance mean_N(g) held inside it.
 *
 * Fitting a, b, s and β on the same M pairs biases the estimate by O(1/M), small beside its
 * spread (a test checks the coverage on synthetic data). With fewer than 3 pairs, no extra cheap
 * samples or a ratio that is not positive, it is the plain share of the fine runs.
 */
export function controlVariateChance(fine: ArrayLike<number>, coarse: ArrayLike<number>): ChanceEstimate {
  const M = fine.length;
  const N = coarse.length;
  let positive = true;
  for (let i = 0; i < M; i++) if (!(fine[i] > 0)) positive = false;
  for (let i = 0; i < N; i++) if (!(coarse[i] > 0)) positive = false;
  if (M < 3 || N <= M || !positive) return monteCarloChance(fine);

  const control = fittedChance(fine, coarse);
  const g = new Float64Array(N);
  for (let i = 0; i < N; i++) g[i] = control(coarse[i]);
  const I = Float64Array.from({ length: M }, (_, i) => (fine[i] >= 1 ? 1 : 0));
  const gM = g.subarray(0, M);
  const gR = g.subarray(M);
  const meanI = mean(I);
  const meanGM = mean(gM);
  const meanGN = mean(g);
  const base = { method: 'control-variates' as const, runs: M, controlSamples: N };

  if (meanI === 0 || meanI === 1) {
    const interval = wilsonInterval(meanI, M);
    return { ...base, probability: Math.min(interval[1], Math.max(interval[0], meanGN)), interval };
  }

  const varG = variance(gM, meanGM);
  const beta = varG > 0 ? covariance(I, meanI, gM, meanGM) / varG : 0;
  const p = meanI - beta * (meanGM - meanGN);
  const f = 1 - M / N;
  const corrected = Float64Array.from(I, (x, i) => x - beta * f * gM[i]);
  const v = variance(corrected, mean(corrected)) / M + (gR.length > 1 ? (beta * f) ** 2 * (variance(gR, mean(gR)) / gR.length) : 0);
  const probability = Math.min(1, Math.max(0, p));
  const pv = Math.min(1 - 1 / N, Math.max(1 / N, probability));
  const nEff = v > 0 ? Math.min(N, Math.max(1, (pv * (1 - pv)) / v)) : N;
  return { ...base, probability, interval: wilsonInterval(probability, nEff) };
}

/**
 * The control of `controlVariateChance`: the log-linear least-squares fit of the fine ratio on the
 * coarse one over the pairs, and from it the chance a coarse ratio's fine ratio reaches 1.
 */
function fittedChance(fine: ArrayLike<number>, coarse: ArrayLike<number>): (coarse: number) => number {
  const M = fine.length;
  const x = Float64Array.from({ length: M }, (_, i) => Math.log(coarse[i]));
  const y = Float64Array.from({ length: M }, (_, i) => Math.log(fine[i]));
  const mx = mean(x);
  const my = mean(y);
  const vx = variance(x, mx);
  const b = vx > 0 ? covariance(x, mx, y, my) / vx : 0;
  const a = my - b * mx;
  let ss = 0;
  for (let i = 0; i < M; i++) ss += (y[i] - a - b * x[i]) ** 2;
  const s = Math.sqrt(ss / (M - 2));
  // A spread below rounding is none: the relation is exact and the control its hard indicator.
  return s > 1e-12 ? (c) => normalCdf((a + b * Math.log(c)) / s) : (c) => (a + b * Math.log(c) >= 0 ? 1 : 0);
}

function mean(v: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < v.length; i++) s += v[i];
  return s / v.length;
}

/** Sample variance (n − 1). */
function variance(v: ArrayLike<number>, m: number): number {
  return covariance(v, m, v, m);
}

function covariance(u: ArrayLike<number>, mu: number, v: ArrayLike<number>, mv: number): number {
  let s = 0;
  for (let i = 0; i < u.length; i++) s += (u[i] - mu) * (v[i] - mv);
  return s / (u.length - 1);
}
