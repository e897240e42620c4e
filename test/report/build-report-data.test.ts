import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { buildReportData } from '../../src/report/build-report-data.ts';
import { investigate } from '../../src/finding/investigate.ts';
import { resizeCase } from '../../src/resize/resize-case.ts';
import { TOLERANCED_SAMPLE } from './report-fixtures.ts';

describe('buildReportData', () => {
  const c = parseCase(readFileSync(TOLERANCED_SAMPLE, 'utf8'));

  it('buildReportData gives the results of investigate and the resize of those very results', () => {
    const data = buildReportData(c, { samples: 1500, seed: 3, factor: 2 });
    expect(data.results).toEqual(investigate(c, { samples: 1500, seed: 3 }));
    expect(data.results.uncertainty).toMatchObject({ samples: 1500, seed: 3 });
    expect(data.resize.results).toBe(data.results);
    expect(data.resize.designFactor).toBe(2);
    expect(data.resize).toEqual(resizeCase(c, data.results, { factor: 2 }));
  });

  it('buildReportData with the same seed gives the same numbers, and --samples 0 leaves the uncertainty run out', () => {
    expect(buildReportData(c, { samples: 1500, seed: 3 }).results.uncertainty).toEqual(buildReportData(c, { samples: 1500, seed: 3 }).results.uncertainty);
    expect(buildReportData(c, { samples: 0 }).results.uncertainty).toBeUndefined();
  });
});
