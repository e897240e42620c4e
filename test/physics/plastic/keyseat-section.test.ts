import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fourFigures, keyseatDepth, keyseatPlasticRatio } from '../../../src/physics/plastic/keyseat-section.ts';

/**
 * Independent of the program: the fully plastic torque T_P = 2τ_Y·∫φ dA + 2τ_Y·φ_i·A_bore with the
 * sand heap φ = min(distance to the outer contour, φ_i + distance to the bore), φ_i = R − t − c₁
 * (Nadai's sand-heap analogy; A. Nadai, Theory of Flow and Fracture of Solids, vol. 1, 1950; from
 * memory, confident), on a fine Cartesian grid over the whole section (the program uses a polar
 * grid over half of it), against the closed form of the gross round section (REFERENCE 3.1.5, 3.2.2).
 * Also the kinematic upper bound τ_Y·∫r dA over the net section (every fibre at τ_Y round the axis).
 */
function cartesian(d: number, bore: number, w: number, t: number, n = 600): { heap: number; upper: number } {
  const R = d / 2;
  const c1 = bore / 2;
  const h = d / n;
  const phiBore = R - t - c1;
  let heap = 0;
  let upper = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const x = -R + (i + 0.5) * h;
      const y = -R + (j + 0.5) * h;
      const r = Math.hypot(x, y);
      if (r > R || r < c1) continue;
      if (Math.abs(x) <= w / 2 && y >= R - t) continue;
      const toKeyseat = Math.hypot(Math.max(0, Math.abs(x) - w / 2), Math.max(0, R - t - y));
      heap += Math.min(R - r, toKeyseat, phiBore + r - c1) * h * h;
      upper += r * h * h;
    }
  }
  const grossHeap = (Math.PI / 3) * (R ** 3 - c1 ** 3); // ∫φ dA + φ_i·A_bore of the gross section: T_P/(2τ_Y)
  const grossUpper = ((2 * Math.PI) / 3) * (R ** 3 - c1 ** 3);
  return { heap: (heap + phiBore * Math.PI * c1 * c1) / grossHeap, upper: upper / grossUpper };
}

describe('keyseatPlasticRatio: the net section of a keyed seat, fully plastic', () => {
  it('is 1 without a keyseat', () => {
    expect(keyseatPlasticRatio({ diameter: 0.05, bore: 0, width: 0, depth: 0 })).toBe(1);
  });

  // DIN 6885 parallel keys (b × h, shaft depth t1; from memory, verify): Ø50 14 × 9, t1 5.5; Ø40
  // 12 × 8, t1 5; Ø75 20 × 12, t1 7.5; Ø100 28 × 16, t1 10.
  it.each([
    [0.05, 0.014, 0.0055],
    [0.04, 0.012, 0.005],
    [0.075, 0.02, 0.0075],
    [0.1, 0.028, 0.01],
  ])('a solid Ø%s m seat with a %s m × %s m keyseat agrees with the sand heap on a fine grid within 0.05 %, below the upper bound τ_Y·∫r dA', (d, w, t) => {
    const ratio = keyseatPlasticRatio({ diameter: d, bore: 0, width: w, depth: t });
    const ref = cartesian(d, 0, w, t);
    expect(Math.abs(ratio / ref.heap - 1)).toBeLessThan(5e-4);
    expect(ratio).toBeLessThan(ref.upper);
    // Some 9 to 12 % below the gross section for standard keys; the equivalent diameter d − t would take about 30 %.
    expect(ratio).toBeGreaterThan(0.85);
    expect(ratio).toBeLessThan(0.93);
    expect(ratio).toBeGreaterThan(((d - t) / d) ** 3);
  });

  it('a hollow seat: the bore holds the heap at the keyseat floor’s height, as on the fine grid', () => {
    const ratio = keyseatPlasticRatio({ diameter: 0.1, bore: 0.04, width: 0.028, depth: 0.01 });
    expect(Math.abs(ratio / cartesian(0.1, 0.04, 0.028, 0.01).heap - 1)).toBeLessThan(5e-4);
    // A vanishing keyseat leaves the hollow section's own (2π/3)·τ_Y·(c₂³ − c₁³).
    expect(Math.abs(keyseatPlasticRatio({ diameter: 0.1, bore: 0.04, width: 1e-7, depth: 1e-7 }) - 1)).toBeLessThan(2e-4);
  });

  it('a wider or deeper keyseat never carries more (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 0.35, noNaN: true }), fc.double({ min: 0.03, max: 0.15, noNaN: true }), fc.double({ min: 1.05, max: 1.5, noNaN: true }), (w, t, grow) => {
        const base = keyseatPlasticRatio({ diameter: 1, bore: 0, width: w, depth: t });
        expect(keyseatPlasticRatio({ diameter: 1, bore: 0, width: w * grow, depth: t })).toBeLessThanOrEqual(base + 1e-9);
        expect(keyseatPlasticRatio({ diameter: 1, bore: 0, width: w, depth: t * grow })).toBeLessThanOrEqual(base + 1e-9);
      }),
      { numRuns: 20 },
    );
  });

  it('the keyseat is h − the hub depth deep, else half the key (the h/2 rule)', () => {
    expect(keyseatDepth({ height: 0.009, hubDepth: 0.0035 })).toBeCloseTo(0.0055, 12);
    expect(keyseatDepth({ height: 0.01 })).toBe(0.005);
  });
});

describe('fourFigures: the proportions rounded without strings', () => {
  it('gives the double Number(x.toPrecision(4)) reads, and one code per rounded value (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-9, max: 9.9, noNaN: true }), fc.double({ min: 1e-9, max: 9.9, noNaN: true }), (x, y) => {
        const a = fourFigures(x);
        const b = fourFigures(y);
        expect(a.value).toBe(Number(x.toPrecision(4)));
        expect(a.code === b.code).toBe(a.value === b.value);
      }),
      { numRuns: 2000 },
    );
    // Ties and the ends of a decade.
    for (const x of [0.1, 0.09999, 0.099995, 1, 0.5, 0.12345, 9.9995]) expect(fourFigures(x).value).toBe(Number(x.toPrecision(4)));
    expect(fourFigures(0)).toEqual({ value: 0, code: 0 });
  });
});
