import type { Case } from '../case/case.ts';
import { sampleCopy, type UncertainInput } from './inputs.ts';
import { normalSource, seededRandom } from './random.ts';

/** The numbers a Monte Carlo sample keeps from one run of the engine. */
export interface Metrics {
  yieldRatio: number;
  maxShearStress: number;
  peakTorque: number;
  /** Largest permanent twist over the sides, rad; 0 when elastic. Undefined when the engine gives none. */
  permanentTwist?: number;
  /** For each measured permanent twist, the speed at the stop that leaves it, rad/s (undefined: none does). */
  speedsForMeasured?: (number | undefined)[];
}

/**
 * One run of the engine on a case: the same function the single run uses. An engine may carry a
 * `plan`: set up once for a case and its drawn inputs, it runs a sample from the drawn values (in
 * the inputs' order) and gives the numbers the engine gives for the case with those values set.
 * Without one, each sample's values are set in one copy of the case (`sampleCopy`).
 */
export type Engine = ((c: Case) => Metrics) & { plan?: SamplePlanner };

/** An engine set up once per case for many samples (`Engine.plan`). */
export type SamplePlanner = (c: Case, inputs: readonly UncertainInput[]) => (values: Float64Array) => Metrics;

/** Case by case: all of a sample's drawn values set in one copy of the case, then the engine on it. */
function caseByCase(engine: (c: Case) => Metrics): SamplePlanner {
  return (c, inputs) => (values) => {
    const k = sampleCopy(c);
    for (let i = 0; i < inputs.length; i++) inputs[i].set(k, values[i]);
    return engine(k);
  };
}

/** The sampled metrics, one array per metric, one entry per sample. */
export interface Samples {
  yieldRatio: Float64Array;
  maxShearStress: Float64Array;
  peakTorque: Float64Array;
  permanentTwist: Float64Array | undefined;
  /** Per measured twist, the speeds that explain it, one per sample (NaN where none does). */
  speedsForMeasured: Float64Array[];
}

/** Draws of one input below its floor before it is held there (never reached with the bands the reader lets through). */
const MAX_REDRAWS = 1000;

/**
 * Draws every input from its spread, runs the engine, keeps the metrics. Reproducible: the same
 * seed gives the same numbers. Each spread is a normal truncated at 1 % of its nominal: a draw
 * below that is drawn again (the case reader refuses a band as wide as the value, so this happens
 * for at most about 2 % of draws, and does not pile samples up at the floor). A nominal of zero (a
 * measured twist of "0 deg ± 0.5 deg") is held at zero or more: a reading cannot be negative.
 */
export function monteCarlo(c: Case, inputs: readonly UncertainInput[], engine: Engine, samples: number, seed: number, onProgress?: (done: number, total: number) => void): Samples {
  const z = normalSource(seededRandom(seed));
  const out: Samples = {
    yieldRatio: new Float64Array(samples),
    maxShearStress: new Float64Array(samples),
    peakTorque: new Float64Array(samples),
    permanentTwist: undefined,
    speedsForMeasured: [],
  };
  const run = (engine.plan ?? caseByCase(engine))(c, inputs);
  // Drawn in the inputs' order, sample after sample, from one stream: the same seed gives the same draws whatever the engine.
  const values = new Float64Array(inputs.length);
  for (let i = 0; i < samples; i++) {
    for (let j = 0; j < inputs.length; j++) {
      const input = inputs[j];
      const floor = 0.01 * input.nominal;
      let v = input.spread.mean + input.spread.sd * z();
      for (let tries = 0; floor > 0 && v < floor && tries < MAX_REDRAWS; tries++) v = input.spread.mean + input.spread.sd * z();
      values[j] = Math.max(v, floor);
    }
    const m = run(values);
    onProgress?.(i + 1, samples);
    out.yieldRatio[i] = m.yieldRatio;
    out.maxShearStress[i] = m.maxShearStress;
    out.peakTorque[i] = m.peakTorque;
    if (m.permanentTwist !== undefined) {
      out.permanentTwist ??= new Float64Array(samples);
      out.permanentTwist[i] = m.permanentTwist;
    }
    m.speedsForMeasured?.forEach((w, k) => {
      out.speedsForMeasured[k] ??= new Float64Array(samples);
      out.speedsForMeasured[k][i] = w ?? NaN;
    });
  }
  return out;
}
