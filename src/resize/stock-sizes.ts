import type { Case } from '../case/case.ts';

const MM = 1e-3;
const INCH = 0.0254;
/** Diameters within this fraction of a stock size count as that size (sums of SI factors carry rounding). */
const SNAP = 1e-9;

/**
 * The preferred stock-size series of bar for a replacement shaft, by the case's units. Metric:
 * whole millimetres up to 50 mm, then steps of 5 mm. Inch: 1/16 in up to 2 in, then 1/8 in. These
 * are the project's documented series (common bar-stock practice), not a standard's table.
 */
export const STOCK_SERIES: Record<Case['units'], { unit: number; fine: number; limit: number; coarse: number; text: string }> = {
  metric: { unit: MM, fine: 1, limit: 50, coarse: 5, text: 'whole millimetres up to 50 mm, then steps of 5 mm' },
  us: { unit: INCH, fine: 1 / 16, limit: 2, coarse: 1 / 8, text: '1/16 in up to 2 in, then 1/8 in' },
};

/** The smallest stock size at or above `diameter` (m), in the case's series. */
export function stockSizeUp(diameter: number, units: Case['units']): number {
  const s = STOCK_SERIES[units];
  const x = diameter / s.unit;
  const step = x <= s.limit * (1 + SNAP) ? s.fine : s.coarse;
  const n = Math.ceil(x / step - SNAP);
  return n * step * s.unit;
}

/** Every stock size from `lo` to `hi` (m), in the case's series, smallest first. */
export function stockSizesBetween(lo: number, hi: number, units: Case['units']): number[] {
  const sizes: number[] = [];
  for (let d = stockSizeUp(lo, units); d <= hi * (1 + SNAP); d = stockSizeUp(d * (1 + 1e-6), units)) sizes.push(d);
  return sizes;
}
