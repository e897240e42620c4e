import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { withFinding } from '../../src/finding/investigation.ts';

const sample = (f: string) => withFinding(analyseCase(parseCase(readFileSync(new URL(`../../sample-cases/${f}`, import.meta.url), 'utf8'))));

describe('resultsToJson: the dynamic model', () => {
  it('gives dynamic with its maxima, per-segment peaks and slips, from Results as they are', () => {
    const r = sample('roll-line-limiter-two-sides.yaml');
    const j = resultsToJson(r) as Record<string, any>;
    expect(j.verdict_basis).toBe(r.verdictBasis);
    expect(j.verdict_reason).toBe(r.verdictReason);
    const d = j.dynamic;
    expect(d.natural_frequencies_Hz).toEqual(r.dynamic.naturalFrequencies);
    expect(d.peak_torque_Nm).toBe(Math.max(...d.segments.map((s: any) => s.peak_torque_Nm)));
    expect(d.max_shear_stress_Pa).toBe(Math.max(...d.segments.map((s: any) => s.shear_stress_Pa)));
    expect(d.yield_ratio).toBe(Math.max(...d.segments.map((s: any) => s.yield_ratio)));
    expect(d.duration_s).toBe(r.dynamic.duration);
    expect(d.time_step_s).toBe(r.dynamic.timeStep);
    expect(d.elements).toBe(r.dynamic.elements);
    expect(d.segments[0]).toEqual({
      from_m: 0.1,
      to_m: 0.2,
      peak_torque_Nm: r.dynamic.pieces[0].peakTorque,
      elastic_peak_torque_Nm: r.dynamic.pieces[0].elasticPeakTorque,
      shear_stress_Pa: r.dynamic.pieces[0].shearStress,
      yield_ratio: r.dynamic.pieces[0].yieldRatio,
      permanent_twist_rad: r.dynamic.pieces[0].permanentTwist,
      max_shear_strain: r.dynamic.pieces[0].maxShearStrain,
      broken: false,
      break_time_s: null,
    });
    expect(d.slip.map((s: any) => s.element)).toEqual(['the torque limiter in "limiter hub seat"', 'the belt at "drive pulley"']);
    expect(d.slip[0].energy_J).toBe(r.dynamic.slips[0].energy);
    expect(d.slip[0].angle_rad).toBe(r.dynamic.slips[0].angle);
    // Verdict keys follow the basis; sides stay the energy method.
    expect(j.verdict_yield_ratio).toBe(d.yield_ratio);
    expect(j.sides[0].peak_torque_Nm).toBe(r.sides[0].peakTorque);
  });

  it('is plain JSON: no typed arrays, no NaN', () => {
    const text = JSON.stringify(resultsToJson(sample('granulator-tramp-metal.yaml')));
    expect(text).not.toMatch(/NaN|Infinity/);
    expect(JSON.parse(text).dynamic.slip).toHaveLength(1);
  });
});
