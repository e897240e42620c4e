import { controlVariateChance, monteCarloChance } from '../../src/uncertainty/chance.ts';
import { normalCdf } from '../../src/uncertainty/normal-cdf.ts';
import { normalSource, seededRandom } from '../../src/uncertainty/random.ts';

/**
 * Synthetic paired samples with a known chance: ln Y_cheap = −0.1625 + 0.06·Z₁ and
 * ln Y_fine = a0 + k·ln Y_cheap + r·Z₂, so ln Y_fine is normal and P(Y_fine ≥ 1) is Φ of its mean
 * over its spread.
 */
export function synthetic(seed: number, a0: number, k: number, r: number, M: number, N: number) {
  const z = normalSource(seededRandom(seed));
  const coarse = new Float64Array(N);
  const fine = new Float64Array(M);
  for (let i = 0; i < N; i++) {
    const x = -0.1625 + 0.06 * z();
    const e = z();
    coarse[i] = Math.exp(x);
    if (i < M) fine[i] = Math.exp(a0 + k * x + r * e);
  }
  const truth = normalCdf((a0 - 0.1625 * k) / Math.hypot(0.06 * k, r));
  return { fine, coarse, truth };
}

/** Share of `repeats` seeded synthetic runs (40 fine, N cheap) whose interval covers the truth, and the mean widths. */
export function coverage(a0: number, k: number, r: number, repeats: number, N: number) {
  let covered = 0;
  let width = 0;
  let plainWidth = 0;
  for (let s = 0; s < repeats; s++) {
    const { fine, coarse, truth } = synthetic(100 + s, a0, k, r, 40, N);
    const c = controlVariateChance(fine, coarse);
    if (c.interval[0] <= truth && truth <= c.interval[1]) covered++;
    width += c.interval[1] - c.interval[0];
    const m = monteCarloChance(fine);
    plainWidth += m.interval[1] - m.interval[0];
  }
  return { covered: covered / repeats, width: width / repeats, plainWidth: plainWidth / repeats };
}
