import { describe, expect, it } from 'vitest';
import { reportJson } from '../../src/report/report-json.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { fixture, RUN } from './report-fixtures.ts';

describe('reportJson', () => {
  it('reportJson is what check --json prints, plus the inputs, the version, the run time and the case hash', () => {
    const { results, source } = fixture('two-sided-pump.yaml');
    const json = reportJson(results, RUN, source);
    const { inputs, tool_version, ran_at, case_file, case_sha256, ...rest } = json;
    expect(rest).toEqual(resultsToJson(results));
    expect(tool_version).toBe('9.9.9-test');
    expect(ran_at).toBe('2026-12-01T10:20:30+00:00');
    expect(case_file).toBe('two-sided-pump.yaml');
    expect(case_sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(inputs).toMatchObject({ units: 'us', speed_rad_s: results.speed, stop: { at: 'coupling', duration_s: 0.015 } });
  });
});
