import { normalCdf } from './normal-cdf.ts';
import { seededRandom } from './random.ts';

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
 *    costs nothing for all N samples and, where the relation holds, is the fine indicator
 *    I = [Y_fine ≥ 1]'s expectation given the cheap ratio: the control that removes the most
 *    variance, where the hard [fit ≥ 1] is right or wrong by a whole 1 near the threshold.
 * 3. p = mean_M(I) − β·(mean_M(g) − mean_N(g)), β = cov_M(I, g)/var_M(g). For a fixed β its
 *    variance is var_M(I − β·(1 − M/N)·g)/M + β²·(1 − M/N)²·var(g)/(N − M) (mean_N(g) =
 *    (M/N)·mean_M(g) + (1 − M/N)·mean of the N − M extra samples, the two parts independent).
 *    That formula leaves out that a, b, s and β are fitted on the same M pairs, which on synthetic
 *    data left the spread some 15 % short (coverage near 88 %); a bootstrap over the pairs
 *    (200 rounds, fixed seed; Efron & Tibshirani, An Introduction to the Bootstrap, 1993; from
 *    memory) refits everything and carries it, and the larger of the two variances is kept.
 * 4. The 95 % interval is Wilson's at p with the effective sample size p(1 − p)/variance (the
 *    plain runs that would be as sure; after Korn & Graubard, Survey Methodology 24, 1998, from
 *    memory), so it stays within [0, 1] and asymmetric near the ends. That size is at most N, the
 *    cheap samples' own limit, and at least M: with the best β the estimator's variance is the
 *    plain runs' times 1 − (1 − M/N)·ρ² (ρ the correlation of I and g), never more, so an interval
 *    wider than the runs' own is the bootstrap's noise with few hits (seen on synthetic data with
 *    p near 5 %, where it kept the coverage near 95 % either way).
 * 5. Where the M fine runs all agree (none or every one reaches 1), their spread says nothing of how
 *    far the control can be trusted: the interval is Wilson's from the M runs alone (0 of 40 gives
 *    [0, 8.8 %]), and the point is the fitted relation's chance mean_N(g) held inside it.
 *
 * Fitting on the same pairs biases the estimate by O(1/M), small beside its spread (a test checks
 * the coverage on synthetic data). Cost, for 40 runs and 10 000 samples: some 5 ms where the
 * relation is close (the screw-conveyor sample) to 15 ms where it is loose, mostly the bootstrap. With fewer than 3 pairs, no extra cheap samples or a ratio that is not positive, it is
 * the plain share of the fine runs.
 */
export function controlVariateChance(fine: ArrayLike<number>, coarse: ArrayLike<number>): ChanceEstimate {
  const M = fine.length;
  const N = coarse.length;
  let positive = true;
  for (let i = 0; i < M; i++) if (!(fine[i] > 0)) positive = false;
  for (let i = 0; i < N; i++) if (!(coarse[i] > 0)) positive = false;
  if (M < 3 || N <= M || !positive) return monteCarloChance(fine);

  const y = Float64Array.from({ length: M }, (_, i) => Math.log(fine[i]));
  const x = Float64Array.from({ length: N }, (_, i) => Math.log(coarse[i]));
  const all = Array.from({ length: M }, (_, i) => i);
  const est = pairedEstimate(y, x, all);
  const base = { method: 'control-variates' as const, runs: M, controlSamples: N };
  if (est.share === 0 || est.share === 1) {
    const interval = wilsonInterval(est.share, M);
    return { ...base, probability: Math.min(interval[1], Math.max(interval[0], est.fitted)), interval };
  }
  // The bootstrap of step 3: the fit's own uncertainty, which the formula leaves out.
  const uniform = seededRandom(BOOTSTRAP_SEED);
  const population = x.slice(0, Math.min(N, BOOTSTRAP_POPULATION)).sort();
  const again = new Float64Array(BOOTSTRAP_ROUNDS);
  for (let b = 0; b < BOOTSTRAP_ROUNDS; b++) {
    const idx = Array.from({ length: M }, () => Math.floor(uniform() * M));
    again[b] = pairedEstimate(y, x, idx, population).estimate;
  }
  const v = Math.max(est.variance, variance(again, mean(again)) + est.cheapVariance);
  const probability = Math.min(1, Math.max(0, est.estimate));
  const pv = Math.min(1 - 1 / N, Math.max(1 / N, probability));
  const nEff = v > 0 ? Math.min(N, Math.max(M, (pv * (1 - pv)) / v)) : N;
  return { ...base, probability, interval: wilsonInterval(probability, nEff) };
}

const BOOTSTRAP_ROUNDS = 200;
const BOOTSTRAP_SEED = 1;
/** Cheap samples a bootstrap round takes the control's mean over. */
const BOOTSTRAP_POPULATION = 2000;

/**
 * The estimate of `controlVariateChance` on the pairs `idx` (indices into `y`, repeats allowed),
 * from the log ratios: `y` the fine model's (M), `x` the coarse model's (N, the first M paired).
 * `population`, for a bootstrap round: the control's mean is taken over these (sorted) log ratios
 * instead of all of `x` (the rounds differ by their fit, which a few thousand samples follow as
 * well as all do), and the round's own variance is not needed.
 */
function pairedEstimate(y: Float64Array, x: Float64Array, idx: readonly number[], population?: Float64Array) {
  const M = idx.length;
  const N = x.length;
  const fit = fitRelation(y, x, idx);
  const I = Float64Array.from(idx, (i) => (y[i] >= 0 ? 1 : 0));
  const gM = Float64Array.from(idx, (i) => chanceAt(fit, x[i]));
  const share = mean(I);
  const meanGM = mean(gM);
  const varG = variance(gM, meanGM);
  const beta = varG > 0 ? covariance(I, share, gM, meanGM) / varG : 0;
  if (population) {
    const fitted = meanChance(fit, population);
    return { share, fitted, estimate: share - beta * (meanGM - fitted), variance: NaN, cheapVariance: NaN };
  }
  const g = Float64Array.from(x, (u) => chanceAt(fit, u));
  const fitted = mean(g);
  const f = 1 - M / N;
  const corrected = Float64Array.from(I, (v, k) => v - beta * f * gM[k]);
  const cheapVariance = ((beta * f) ** 2 * variance(g, fitted)) / (N - M);
  return { share, fitted, estimate: share - beta * (meanGM - fitted), variance: variance(corrected, mean(corrected)) / M + cheapVariance, cheapVariance };
}

/** The fitted relation ln Y_fine = a + b·ln Y_coarse, with residual spread s (0: exact). */
interface Relation {
  a: number;
  b: number;
  s: number;
}

/**
 * The control of `controlVariateChance`: the least-squares line of the fine log ratio `y` on the
 * coarse one `x` over the pairs `idx`.
 */
function fitRelation(y: Float64Array, x: Float64Array, idx: readonly number[]): Relation {
  const M = idx.length;
  const xs = Float64Array.from(idx, (i) => x[i]);
  const ys = Float64Array.from(idx, (i) => y[i]);
  const mx = mean(xs);
  const my = mean(ys);
  const vx = variance(xs, mx);
  const b = vx > 0 ? covariance(xs, mx, ys, my) / vx : 0;
  const a = my - b * mx;
  let ss = 0;
  for (let i = 0; i < M; i++) ss += (ys[i] - a - b * xs[i]) ** 2;
  // A spread below rounding is none: the relation is exact and the control its hard indicator.
  const s = Math.sqrt(ss / (M - 2));
  return { a, b, s: s > 1e-12 ? s : 0 };
}

/** The chance the relation gives a coarse log ratio `u` of a fine ratio of 1 or more, the residuals taken as normal. */
function chanceAt(r: Relation, u: number): number {
  const m = r.a + r.b * u;
  return r.s > 0 ? normalCdf(m / r.s) : m >= 0 ? 1 : 0;
}

/** Beyond this many residual spreads from the threshold, Φ is 0 or 1 to within 1e-10. */
const SATURATED = 6.5;

/**
 * The mean of `chanceAt` over `sorted` (ascending): only the samples within SATURATED spreads of the
 * threshold are evaluated, the rest count as 0 or 1, so a close relation costs a few evaluations.
 */
function meanChance(r: Relation, sorted: Float64Array): number {
  const n = sorted.length;
  if (r.b === 0 || r.s === 0) {
    let sum = 0;
    for (let i = 0; i < n; i++) sum += chanceAt(r, sorted[i]);
    return sum / n;
  }
  // The band of u where |a + b·u| < SATURATED·s, in ascending u.
  const ends = [(-SATURATED * r.s - r.a) / r.b, (SATURATED * r.s - r.a) / r.b];
  const lo = firstAtLeast(sorted, Math.min(...ends));
  const hi = firstAtLeast(sorted, Math.max(...ends));
  let sum = r.b > 0 ? n - hi : lo;
  for (let i = lo; i < hi; i++) sum += chanceAt(r, sorted[i]);
  return sum / n;
}

/** The first index of `sorted` whose value is at least `v` (its length if none). */
function firstAtLeast(sorted: Float64Array, v: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
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
