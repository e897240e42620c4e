import type { Case } from '../case/case.ts';
import { controlVariateChance, monteCarloChance, type ChanceEstimate } from './chance.ts';
import { uncertainInputs, type SpreadBasis } from './inputs.ts';
import { monteCarlo, type Engine } from './monte-carlo.ts';
import { p5p50p95 } from './percentiles.ts';
import { sensitivity, type Swing } from './sensitivity.ts';

export interface UncertaintyOptions {
  samples: number;
  seed: number;
  /** Coefficient of variation of material strengths (0 switches the strength spread off). */
  strengthScatter: number;
}

/** How sure the finding is: ranges, the chance of yield and which input matters most. */
export interface Uncertainty {
  samples: number;
  seed: number;
  strengthScatter: number;
  /** Field paths varied, with their spread (mean, sd; SI) and how it was chosen. */
  inputs: { path: string; mean: number; sd: number; basis: SpreadBasis }[];
  /** Toleranced fields the Monte Carlo does not vary (lengths, positions). */
  notVaried: string[];
  /** Share of samples whose yield ratio is 1 or more (`yieldChance.probability`). */
  yieldProbability: number;
  /** The energy method's chance of a yield ratio of 1 or more, from its samples, with its 95 % interval. */
  yieldChance: ChanceEstimate;
  percentiles: {
    yieldRatio: [number, number, number];
    maxShearStress: [number, number, number];
    peakTorque: [number, number, number];
    permanentTwist?: [number, number, number];
  };
  /** Largest effect first. */
  sensitivity: Swing[];
  /**
   * For each measured permanent twist: the 5–95 % interval of the speeds at the stop that explain it
   * (over the samples where some speed does), whether the recorded speed lies inside, and the share
   * of samples in which no speed explains it.
   */
  observed: { between: [string, string]; speedInterval: [number, number] | null; recordedInside: boolean; unexplainedShare: number }[];
  /** Raw yield-ratio samples, for the report's histogram. */
  yieldRatioSamples: Float64Array;
  /**
   * Where the verdict stands on the dynamic model: the same inputs drawn (same seed) through the
   * dynamic model, fewer samples since each is a full time solution.
   */
  dynamic?: DynamicUncertainty;
}

export interface DynamicUncertainty {
  samples: number;
  /** The dynamic model's chance of a peak yield ratio of 1 or more (`yieldChance.probability`). */
  yieldProbability: number;
  /**
   * The dynamic model's chance of a peak yield ratio of 1 or more over the window, with its 95 %
   * interval: its own samples, corrected by the energy method's samples of the same draws where
   * there are more of those (`controlVariateChance`).
   */
  yieldChance: ChanceEstimate;
  percentiles: { yieldRatio: [number, number, number]; peakTorque: [number, number, number]; maxShearStress: [number, number, number] };
}

/**
 * The dynamic model's share of the uncertainty run: the case's inputs drawn `samples` times (same
 * seed as the main run) through `engine`; `onProgress(done, total)` lets a terminal show progress.
 * `control`: the energy method's yield ratios from the main run (`Uncertainty.yieldRatioSamples`,
 * same case, seed and strength scatter, so its first `samples` are the same draws, as `monteCarlo`
 * draws each sample's inputs in turn from one seeded stream); its chance then helps the dynamic
 * model's. Without it, the chance is the plain share.
 */
export function runDynamicUncertainty(c: Case, engine: Engine, opts: UncertaintyOptions, control?: Float64Array, onProgress?: (done: number, total: number) => void): DynamicUncertainty {
  const { inputs } = uncertainInputs(c, opts.strengthScatter);
  const s = monteCarlo(c, inputs, engine, opts.samples, opts.seed, onProgress);
  const yieldChance = control ? controlVariateChance(s.yieldRatio, control) : monteCarloChance(s.yieldRatio);
  return {
    samples: opts.samples,
    yieldProbability: yieldChance.probability,
    yieldChance,
    percentiles: { yieldRatio: p5p50p95(s.yieldRatio), peakTorque: p5p50p95(s.peakTorque), maxShearStress: p5p50p95(s.maxShearStress) },
  };
}

/**
 * Propagates the case's tolerances (and the strength basis of its materials) through `engine` by a
 * seeded Monte Carlo, and ranks the inputs by one-at-a-time swings. Pure: the engine is the same
 * function the single run uses, passed in.
 */
export function runUncertainty(c: Case, engine: Engine, opts: UncertaintyOptions): Uncertainty {
  const { inputs, notVaried } = uncertainInputs(c, opts.strengthScatter);
  const s = monteCarlo(c, inputs, engine, opts.samples, opts.seed);
  const yieldChance = monteCarloChance(s.yieldRatio);
  return {
    samples: opts.samples,
    seed: opts.seed,
    strengthScatter: opts.strengthScatter,
    inputs: inputs.map((i) => ({ path: i.path, mean: i.spread.mean, sd: i.spread.sd, basis: i.basis })),
    notVaried,
    yieldProbability: yieldChance.probability,
    yieldChance,
    percentiles: {
      yieldRatio: p5p50p95(s.yieldRatio),
      maxShearStress: p5p50p95(s.maxShearStress),
      peakTorque: p5p50p95(s.peakTorque),
      ...(s.permanentTwist ? { permanentTwist: p5p50p95(s.permanentTwist) } : {}),
    },
    sensitivity: sensitivity(c, inputs, engine),
    observed: c.observed.permanentTwist.map((m, k) => {
      const all = s.speedsForMeasured[k] ?? new Float64Array(0);
      const found = all.filter((w) => !Number.isNaN(w));
      const interval: [number, number] | null = found.length > 0 ? [p5p50p95(found)[0], p5p50p95(found)[2]] : null;
      return {
        between: m.between,
        speedInterval: interval,
        recordedInside: interval !== null && c.speed >= interval[0] && c.speed <= interval[1],
        unexplainedShare: all.length > 0 ? 1 - found.length / all.length : 1,
      };
    }),
    yieldRatioSamples: s.yieldRatio,
  };
}
