import { describe, expect, it } from 'vitest';
import { reportJson } from '../../src/report/report-json.ts';
import { resizeToJson } from '../../src/views/resize-json.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { fixture, RUN } from './report-fixtures.ts';

describe('reportJson', () => {
  it('reportJson is what check --json prints, plus resize, the inputs, the version, the run time and the case hash', () => {
    const { data, results, source } = fixture('two-sided-pump.yaml');
    const json = reportJson(data, RUN, source);
    const { resize, inputs, tool_version, ran_at, case_file, case_sha256, ...rest } = json;
    expect(rest).toEqual(resultsToJson(results));
    expect(resize).toEqual(resizeToJson(data.resize).resize);
    expect(tool_version).toBe('9.9.9-test');
    expect(ran_at).toBe('2026-12-01T10:20:30+00:00');
    expect(case_file).toBe('two-sided-pump.yaml');
    expect(case_sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(inputs).toMatchObject({ units: 'us', speed_rad_s: results.speed, stop: { at: 'coupling', duration_s: 0.015 } });
  });

  it('reportJson of a case with tolerances carries the uncertainty run with its seed', () => {
    const { data, source } = fixture('screw-conveyor-jam-us.yaml');
    const json = reportJson(data, RUN, source) as { uncertainty: { seed: number; samples: number; yield_probability: number } };
    expect(json.uncertainty).toMatchObject({ seed: data.results.case.analysis.uncertainty.seed, samples: data.results.uncertainty!.samples });
    expect(json.uncertainty.yield_probability).toBe(data.results.uncertainty!.yieldProbability);
  });
});
