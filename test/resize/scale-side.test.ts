import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { withDiameters } from '../../src/resize/change-case.ts';
import { scaleSide } from '../../src/resize/scale-side.ts';
import { sideYieldRatio } from '../../src/resize/side-ratio.ts';
import { rel, run, type Layout } from '../helpers/layout.ts';

const stepped: Layout = {
  rpm: 420,
  segments: [
    [120, 55, 0, 2.2],
    [160, 65, 0],
    [60, 80, 30, 1.4],
    [420, 90, 0],
  ],
  stations: [
    ['sheave', 60, 8],
    ['rotor', 760, 0],
  ],
  stop: 'rotor',
};

describe('scale the side: every segment of the governing side by s = yield_ratio·N', () => {
  it("s equals yield_ratio·N exactly, and the rescaled case's check gives the side a yield ratio of exactly 1/N", () => {
    const { c, r } = run(stepped);
    const o = scaleSide(c, r, 1.5, 1.3);
    expect(o.s).toBe(r.yieldRatio * 1.5);
    expect(o.diameters).toEqual(o.segments.map((g) => g.diameter * o.s));
    // Energy method: C ∝ 1/s⁴, T ∝ s², τ ∝ T/s³ ∝ 1/s (REFERENCE 1.1.10 and 10.10, derived).
    expect(rel(sideYieldRatio(o.rerun, o.side), 1 / 1.5)).toBeLessThan(1e-12);
    // The same check through the engine directly, built here from the option's diameters:
    const again = analyseCase(withDiameters(c, new Map(o.segments.map((g, i) => [g.index, o.diameters[i]]))));
    expect(rel(again.yieldRatio, 1 / 1.5)).toBeLessThan(1e-12);
  });

  it('the bore ratio is kept in every scaled segment', () => {
    const { c, r } = run(stepped);
    const o = scaleSide(c, r, 2, 1.3);
    const seg = o.rerun.case.shaft.segments[2];
    expect(seg.bore / seg.diameter).toBeCloseTo(30 / 80, 12);
  });

  it('an s above max_scale is flagged as not practical; one below 1 as not needed', () => {
    const { c, r } = run(stepped);
    const big = scaleSide(c, r, 1.5, 1.3);
    expect(big.practical).toBe(big.s <= 1.3);
    const gentle = run({ ...stepped, rpm: 5 });
    const small = scaleSide(gentle.c, gentle.r, 1.5, 1.3);
    expect(small.needed).toBe(false);
    expect(small.s).toBeLessThan(1);
  });

  it('stock diameters are the exact ones rounded up, and their rerun is reported too', () => {
    const { c, r } = run(stepped);
    const o = scaleSide(c, r, 1.5, 1.3);
    o.stockDiameters.forEach((d, i) => expect(d).toBeGreaterThanOrEqual(o.diameters[i]));
    expect(o.stockRerun.case.shaft.segments.map((g) => g.diameter)).toEqual(o.stockDiameters);
  });

  it('for any layout and factor the rerun of the scaled side sits at 1/N (law: stress falls as 1/s)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 20, max: 150 }),
        fc.integer({ min: 20, max: 150 }),
        fc.double({ min: 1, max: 3, noNaN: true }),
        fc.double({ min: 10, max: 3000, noNaN: true }),
        (d1, d2, N, rpm) => {
          const { c, r } = run({
            rpm,
            segments: [
              [300, d1, 0, 1.5],
              [400, d2, 0],
            ],
            stations: [
              ['jam', 0, 0],
              ['m', 700, 3],
            ],
            stop: 'jam',
          });
          const o = scaleSide(c, r, N, 1.3);
          return rel(sideYieldRatio(o.rerun, o.side), 1 / N) < 1e-10;
        },
      ),
      { numRuns: 25 },
    );
  });

  it('a larger design factor asks for a larger scale (monotonic)', () => {
    const { c, r } = run(stepped);
    fc.assert(
      fc.property(fc.double({ min: 1, max: 3, noNaN: true }), fc.double({ min: 0.01, max: 1, noNaN: true }), (N, dN) => scaleSide(c, r, N + dN, 1.3).s > scaleSide(c, r, N, 1.3).s),
      { numRuns: 20 },
    );
  });
});
