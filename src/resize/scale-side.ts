import type { Case, Segment } from '../case/case.ts';
import type { SideName } from '../model/shaft-model.ts';
import { designCheck, type DesignCheck } from './design-run.ts';
import type { Results } from '../results/results.ts';
import { withDiameters } from './change-case.ts';
import { sideOf, sideSegments, sideYieldRatio } from './side-ratio.ts';
import { bisect } from './bisect.ts';
import { stockSizeUp } from './stock-sizes.ts';

/** Every segment of the governing side scaled by one factor. */
export interface ScaleSideOption {
  side: SideName;
  /** The scale of every diameter (and bore) of the side, s = yield_ratio·N (by bisection on the rerun where a flexible coupling is on the side). */
  s: number;
  /** The side's present stress / shear yield. */
  presentYieldRatio: number;
  /** s > 1: the present shaft does not keep the factor. */
  needed: boolean;
  /** s ≤ the case's max_scale: the new diameters could still fit the bearings and hubs. */
  practical: boolean;
  maxScale: number;
  /** The present segments that are scaled. */
  segments: Segment[];
  /** Their new diameters, m, exact. */
  diameters: number[];
  /** The same rounded up to stock sizes, m. */
  stockDiameters: number[];
  /** The design check of the scaled case, exact diameters. */
  rerun: DesignCheck;
  /** The design check of the case with the stock diameters. */
  stockRerun: DesignCheck;
}

/**
 * Scales every segment of the side with the highest stress / shear yield by one factor s, bores with them.
 * In the elastic energy method the side's compliance falls as 1/s⁴, so its peak torque rises as s²
 * while each section's stress per torque falls as 1/s³: stress falls as 1/s, and s = yield_ratio·N
 * brings the side's highest stress / shear yield to exactly 1/N (REFERENCE 10.10: d scales linearly with N,
 * derived). With a flexible coupling on the side, s comes from the rerun by bisection instead.
 * Both the exact and the stock-size cases are rerun through the engine.
 */
export function scaleSide(c: Case, r: Results, designFactor: number, maxScale: number): ScaleSideOption {
  const side = r.governing.side.side;
  const indices = sideSegments(sideOf(r, side)).sort((a, b) => a - b);
  const segments = indices.map((i) => c.shaft.segments.find((g) => g.index === i)!);
  const law = r.yieldRatio * designFactor;
  // A flexible coupling's compliance does not scale with the shaft, so the side's torque rises by
  // less than s² and the law above no longer holds: s is then found by bisection on the rerun,
  // between the law's s and s^(1/3) (the torque held, stress as 1/s³), both widened a little.
  const coupled = segments.some((g) => g.coupling?.stiffness !== undefined);
  const ratioAt = (x: number) => sideYieldRatio(designCheck(withDiameters(c, new Map(indices.map((i, k) => [i, segments[k].diameter * x])))), side);
  const s = coupled ? bisect((x) => ratioAt(x) - 1 / designFactor, 0.99 * Math.min(law, Math.cbrt(law)), 1.01 * Math.max(law, Math.cbrt(law)), 1e-14) : law;
  const diameters = segments.map((g) => g.diameter * s);
  const stockDiameters = diameters.map((d) => stockSizeUp(d, c.units));
  const map = (ds: number[]) => new Map(indices.map((i, k) => [i, ds[k]]));
  return {
    side,
    s,
    presentYieldRatio: r.yieldRatio,
    needed: s > 1,
    practical: s <= maxScale,
    maxScale,
    segments,
    diameters,
    stockDiameters,
    rerun: designCheck(withDiameters(c, map(diameters))),
    stockRerun: designCheck(withDiameters(c, map(stockDiameters))),
  };
}
