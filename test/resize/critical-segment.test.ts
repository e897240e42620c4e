import { describe, expect, it } from 'vitest';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { withDiameters } from '../../src/resize/change-case.ts';
import { criticalSegment } from '../../src/resize/critical-segment.ts';
import { othersYieldRatio, segmentYieldRatio } from '../../src/resize/side-ratio.ts';
import { rel, run, type Layout } from '../helpers/layout.ts';

// A short notched coupling end on a long plain shaft: resizing the notched piece alone can work.
const fits: Layout = {
  rpm: 40,
  segments: [
    [100, 60, 0, 1.6],
    [700, 60, 0],
  ],
  stations: [
    ['drive', 0, 30],
    ['jam', 800, 0],
  ],
  stop: 'jam',
};

describe('resize the critical segment only', () => {
  it('finds the smallest diameter at which the segment reaches 1/N with the others still within it', () => {
    const { c, r } = run(fits);
    expect(r.yieldRatio * 1.5).toBeGreaterThan(1);
    const o = criticalSegment(c, r, 1.5);
    expect(o.verdict).toBe('fits');
    expect(o.segment.index).toBe(0);
    // Checked by independent reruns of the engine at the answer and just below it:
    const at = analyseCase(withDiameters(c, new Map([[0, o.diameter!]])));
    // The search stops at a part in a million of the diameter (shown to 4 figures, then rounded up
    // to stock); the stress goes as about d⁻³, so the ratio is within a few parts in a million.
    expect(rel(segmentYieldRatio(at, 'A', 0)!, 1 / 1.5)).toBeLessThan(1e-5);
    expect(othersYieldRatio(at, 'A', 0)).toBeLessThanOrEqual(1 / 1.5);
    const below = analyseCase(withDiameters(c, new Map([[0, o.diameter! * 0.999]])));
    expect(segmentYieldRatio(below, 'A', 0)!).toBeGreaterThan(1 / 1.5);
    expect(o.stockDiameter!).toBeGreaterThanOrEqual(o.diameter!);
  });

  it('says no size works when the rest of the side is then past the factor', () => {
    const { c, r } = run({
      rpm: 420,
      segments: [
        [120, 55, 0, 2.2],
        [640, 65, 0],
      ],
      stations: [
        ['sheave', 60, 8],
        ['rotor', 760, 0],
      ],
      stop: 'rotor',
    });
    const o = criticalSegment(c, r, 1.5);
    expect(o.verdict).toBe('others-critical');
    expect(o.diameter).toBeUndefined();
    expect(o.othersAtOwn).toBeGreaterThan(1 / 1.5);
  });

  it('says the present size keeps the factor when it does', () => {
    const { c, r } = run({ ...fits, rpm: 10 });
    const o = criticalSegment(c, r, 1.5);
    expect(o.verdict).toBe('present-keeps');
    expect(o.diameter!).toBeLessThan(0.06);
  });

  it("the sweep for the figure: the segment's own yield ratio falls as it grows, the side's never falls below the others'", () => {
    const { c, r } = run(fits);
    const o = criticalSegment(c, r, 1.5);
    for (let i = 1; i < o.sweep.length; i++) {
      expect(o.sweep[i].segmentYieldRatio).toBeLessThan(o.sweep[i - 1].segmentYieldRatio);
      expect(o.sweep[i].sideYieldRatio).toBeGreaterThanOrEqual(o.sweep[i].segmentYieldRatio * (1 - 1e-12));
    }
    expect(o.stockSizes.length).toBeGreaterThan(3);
  });
});
