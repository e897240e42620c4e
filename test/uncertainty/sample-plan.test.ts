import { readdirSync, readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Case } from '../../src/case/case.ts';
import { parseCase } from '../../src/case/parse-case.ts';
import { uncertainInputs, type UncertainInput } from '../../src/uncertainty/inputs.ts';
import { monteCarlo, type Metrics } from '../../src/uncertainty/monte-carlo.ts';
import { sampleEngine } from '../../src/uncertainty/sample-engine.ts';
import { planSamples } from '../../src/uncertainty/sample-plan.ts';
import { referenceSampleMetrics } from '../helpers/reference-sample-engine.ts';

const dir = new URL('../../sample-cases/', import.meta.url);
const files = readdirSync(dir).filter((f) => f.endsWith('.yaml'));
const cases = files.map((f): [string, Case] => [f, parseCase(readFileSync(new URL(f, dir), 'utf8'))]);

/** The reference: a fresh case per sample, each input applied in turn, the engine rebuilt from it. */
function reference(c: Case, inputs: readonly UncertainInput[], values: ArrayLike<number>, readBack: boolean): Metrics {
  return referenceSampleMetrics(
    inputs.reduce((k, input, j) => input.apply(k, values[j]), c),
    readBack,
  );
}

/** The same number to the last digit (NaN and undefined included). */
function expectSame(lean: Metrics, ref: Metrics) {
  expect(lean.yieldRatio).toBe(ref.yieldRatio);
  expect(lean.maxShearStress).toBe(ref.maxShearStress);
  expect(lean.peakTorque).toBe(ref.peakTorque);
  expect(lean.permanentTwist).toBe(ref.permanentTwist);
  expect(lean.speedsForMeasured).toEqual(ref.speedsForMeasured);
}

describe('the sample plan, set up once per case', () => {
  it.each(cases)('gives every sample the numbers the engine rebuilt from its case gives, on %s (tolerances and strength scatter)', (_, c) => {
    // Independent calculation: the pre-plan engine (test/helpers) on a fresh case per sample.
    const { inputs } = uncertainInputs(c, 0.08);
    expect(inputs.length).toBeGreaterThan(0);
    for (const readBack of [true, false]) {
      const run = planSamples(c, inputs, readBack);
      fc.assert(
        fc.property(fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: inputs.length, maxLength: inputs.length }), (z) => {
          // Drawn values as the Monte Carlo draws them: normal scores, floored at 1 % of nominal.
          const values = Float64Array.from(inputs, (input, j) => Math.max(input.spread.mean + input.spread.sd * z[j], 0.01 * input.nominal));
          expectSame(run(values), reference(c, inputs, values, readBack));
        }),
        { numRuns: 12, seed: 12 },
      );
    }
  });

  it('keeps the seeded stream: the Monte Carlo through the plan gives the case-by-case samples, sample for sample', () => {
    const c = cases.find(([f]) => f === 'screw-conveyor-jam-us.yaml')![1];
    const { inputs } = uncertainInputs(c, 0.08);
    const planned = monteCarlo(c, inputs, sampleEngine(true), 60, 7);
    const caseByCase = monteCarlo(c, inputs, (k: Case) => referenceSampleMetrics(k, true), 60, 7);
    expect(planned.yieldRatio).toEqual(caseByCase.yieldRatio);
    expect(planned.peakTorque).toEqual(caseByCase.peakTorque);
    expect(planned.maxShearStress).toEqual(caseByCase.maxShearStress);
    expect(planned.permanentTwist).toEqual(caseByCase.permanentTwist);
    expect(planned.speedsForMeasured).toEqual(caseByCase.speedsForMeasured);
  });
});
