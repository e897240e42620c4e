import type { Case, Segment } from '../case/case.ts';
import type { SideName } from '../model/shaft-model.ts';
import { designCheck, energyCheck, type DesignCheck } from './design-run.ts';
import type { Results } from '../results/results.ts';
import { bisect } from './bisect.ts';
import { withDiameters } from './change-case.ts';
import { othersYieldRatio, segmentYieldRatio, sideYieldRatio } from './side-ratio.ts';
import { stockSizeUp, stockSizesBetween } from './stock-sizes.ts';

/** One point of the sweep of the critical segment's diameter. */
export interface DiameterPoint {
  /** m */
  diameter: number;
  /** Highest stress / shear yield on the side in a repeat incident. */
  sideYieldRatio: number;
  /** The critical segment's own stress / shear yield. */
  segmentYieldRatio: number;
}

/**
 * `fits`: a new diameter of the segment alone keeps the side within the factor; `present-keeps`:
 * the present diameter already does; `others-critical`: at the diameter where the segment reaches
 * the factor the other segments, carrying the higher torque of a stiffer shaft, are past it.
 */
export type CriticalVerdict = 'fits' | 'present-keeps' | 'others-critical';

export interface CriticalSegmentOption {
  side: SideName;
  segment: Segment;
  /** The segment's present stress / shear yield. */
  presentYieldRatio: number;
  /** The diameter at which the segment's own stress / shear yield reaches 1/N, m. */
  ownDiameter: number;
  /** The other segments' highest stress / shear yield at `ownDiameter`. */
  othersAtOwn: number;
  verdict: CriticalVerdict;
  /** The smallest diameter that keeps every segment of the side within the factor, m; undefined when none does. */
  diameter?: number;
  stockDiameter?: number;
  rerun?: DesignCheck;
  stockRerun?: DesignCheck;
  /** Repeat-incident stress / shear yield against the segment's diameter, for the report's figure. */
  sweep: DiameterPoint[];
  /** Stock sizes within the sweep, m. */
  stockSizes: number[];
}

const SWEEP_POINTS = 48;

/**
 * Resizes only the most stressed segment (bore ratio kept). Its own stress falls as it grows, but a
 * stiffer segment raises the side's torque (T = √(2E/C)), so the others' stresses rise: the answer
 * is the diameter where its own stress / shear yield reaches 1/N, provided the others are then still within
 * it. Every trial diameter is a rerun of the engine's energy method (what the search and the sweep
 * read); the answer and its stock size are design checks with the dynamic model's modes too.
 */
export function criticalSegment(c: Case, r: Results, designFactor: number): CriticalSegmentOption {
  const side = r.governing.side.side;
  const segment = r.governing.piece.piece.segment;
  const present = segment.diameter;
  const changed = (d: number) => withDiameters(c, new Map([[segment.index, d]]));
  const runAt = (d: number) => energyCheck(changed(d));
  const checkAt = (d: number) => designCheck(changed(d));
  const target = 1 / designFactor;
  const excess = (d: number) => segmentYieldRatio(runAt(d), side, segment.index)! - target;

  let lo = present;
  let hi = present;
  if (excess(present) > 0) for (let i = 0; i < 60 && excess(hi) > 0; i++) hi *= 2;
  else for (let i = 0; i < 60 && excess(lo) <= 0; i++) lo /= 2;
  // To a part in a million: shown to 4 figures and then rounded up to a stock size.
  const ownDiameter = bisect(excess, lo, hi, 1e-6);
  const atOwn = checkAt(ownDiameter);
  const othersAtOwn = othersYieldRatio(atOwn, side, segment.index);
  const fits = othersAtOwn <= target * (1 + 1e-9);
  const verdict: CriticalVerdict = !fits ? 'others-critical' : ownDiameter < present ? 'present-keeps' : 'fits';

  const from = 0.8 * Math.min(present, ownDiameter);
  const to = 1.25 * Math.max(present, ownDiameter);
  // The figure's sweep (an energy-method rerun a point) is run only where the figure is drawn.
  let sweep: CriticalSegmentOption['sweep'] | undefined;
  const sweepOnce = () =>
    (sweep ??= Array.from({ length: SWEEP_POINTS + 1 }, (_, i) => {
      const diameter = from + ((to - from) * i) / SWEEP_POINTS;
      const run = runAt(diameter);
      return { diameter, sideYieldRatio: sideYieldRatio(run, side), segmentYieldRatio: segmentYieldRatio(run, side, segment.index)! };
    }));

  const option: CriticalSegmentOption = {
    side,
    segment,
    presentYieldRatio: r.governing.piece.yieldRatio,
    ownDiameter,
    othersAtOwn,
    verdict,
    get sweep() {
      return sweepOnce();
    },
    stockSizes: stockSizesBetween(from, to, c.units),
  };
  if (fits) {
    option.diameter = ownDiameter;
    option.stockDiameter = stockSizeUp(ownDiameter, c.units);
    option.rerun = atOwn;
    option.stockRerun = checkAt(option.stockDiameter);
  }
  return option;
}
