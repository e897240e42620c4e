import type { Case } from '../case/case.ts';
import { uncertainInputs } from './inputs.ts';
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
  /** Field paths varied, with their spread (mean, sd; SI). */
  inputs: { path: string; mean: number; sd: number }[];
  /** Toleranced fields the Monte Carlo does not vary (lengths, positions). */
  notVaried: string[];
  /** Share of samples whose yield ratio is 1 or more. */
  yieldProbability: number;
  percentiles: {
    yieldRatio: [number, number, number];
    maxShearStress: [number, number, number];
    peakTorque: [number, number, number];
    permanentTwist?: [number, number, number];
  };
  /** Largest effect first. */
  sensitivity: Swing[];
  /** Raw yield-ratio samples, for the report's histogram. */
  yieldRatioSamples: Float64Array;
}

/**
 * Propagates the case's tolerances (and the strength basis of its materials) through `engine` by a
 * seeded Monte Carlo, and ranks the inputs by one-at-a-time swings. Pure: the engine is the same
 * function the single run uses, passed in.
 */
export function runUncertainty(c: Case, engine: Engine, opts: UncertaintyOptions): Uncertainty {
  const { inputs, notVaried } = uncertainInputs(c, opts.strengthScatter);
  const s = monteCarlo(c, inputs, engine, opts.samples, opts.seed);
  let yielded = 0;
  for (const y of s.yieldRatio) if (y >= 1) yielded++;
  return {
    samples: opts.samples,
    seed: opts.seed,
    strengthScatter: opts.strengthScatter,
    inputs: inputs.map((i) => ({ path: i.path, mean: i.spread.mean, sd: i.spread.sd })),
    notVaried,
    yieldProbability: yielded / opts.samples,
    percentiles: {
      yieldRatio: p5p50p95(s.yieldRatio),
      maxShearStress: p5p50p95(s.maxShearStress),
      peakTorque: p5p50p95(s.peakTorque),
      ...(s.permanentTwist ? { permanentTwist: p5p50p95(s.permanentTwist) } : {}),
    },
    sensitivity: sensitivity(c, inputs, engine),
    yieldRatioSamples: s.yieldRatio,
  };
}
