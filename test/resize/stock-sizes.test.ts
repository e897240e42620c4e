import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stockSizesBetween, stockSizeUp } from '../../src/resize/stock-sizes.ts';

const mm = (x: number) => x / 1000;
const inch = (x: number) => x * 0.0254;

describe("stock sizes: the project's series (metric: whole mm to 50 mm, then 5 mm; inch: 1/16 in to 2 in, then 1/8 in)", () => {
  it('rounds metric diameters up to the next whole millimetre up to 50 mm, then to the next 5 mm', () => {
    expect(stockSizeUp(mm(41.2), 'metric')).toBeCloseTo(mm(42), 12);
    expect(stockSizeUp(mm(50), 'metric')).toBeCloseTo(mm(50), 12);
    expect(stockSizeUp(mm(50.2), 'metric')).toBeCloseTo(mm(55), 12);
    expect(stockSizeUp(mm(66.1), 'metric')).toBeCloseTo(mm(70), 12);
  });

  it('rounds inch diameters up to the next 1/16 in up to 2 in, then to the next 1/8 in', () => {
    expect(stockSizeUp(inch(1.9), 'us')).toBeCloseTo(inch(1 + 15 / 16), 12);
    expect(stockSizeUp(inch(2.01), 'us')).toBeCloseTo(inch(2.125), 12);
    expect(stockSizeUp(inch(2 + 7 / 16), 'us')).toBeCloseTo(inch(2.5), 12);
    expect(stockSizeUp(inch(3.126), 'us')).toBeCloseTo(inch(3.25), 12);
  });

  it('keeps a diameter that is already a stock size, despite the rounding of unit factors', () => {
    expect(stockSizeUp(0.055 * (1 + 1e-12), 'metric')).toBeCloseTo(0.055, 12);
    expect(stockSizeUp(1.5 * 0.0254 * (1 + 1e-12), 'us')).toBeCloseTo(1.5 * 0.0254, 12);
  });

  it('is never below the diameter, never a whole step above it, and never decreases', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.002, max: 0.5, noNaN: true }), fc.double({ min: 0, max: 0.1, noNaN: true }), fc.constantFrom('metric' as const, 'us' as const), (d, grow, u) => {
        const s = stockSizeUp(d, u);
        const step = u === 'metric' ? (d <= mm(50) ? mm(1) : mm(5)) : d <= inch(2) ? inch(1 / 16) : inch(1 / 8);
        return s >= d * (1 - 1e-9) && s - d < step * (1 + 1e-9) && stockSizeUp(d * (1 + grow), u) >= s * (1 - 1e-12);
      }),
    );
  });

  it('lists the stock sizes in a range, smallest first', () => {
    const sizes = stockSizesBetween(mm(47.5), mm(61), 'metric').map((d) => Math.round(d * 1e4) / 10);
    expect(sizes).toEqual([48, 49, 50, 55, 60]);
  });
});
