// The done-when of "one finding": every view of every sample case (and of a case of a user's own)
// says the same verdict, piece, ratio and chance, once.
import { readdirSync, readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { buildReportData } from '../../src/report/build-report-data.ts';
import { renderReport } from '../../src/report/render-report.ts';
import { reportJson } from '../../src/report/report-json.ts';
import { findingSentence } from '../../src/views/finding-words.ts';
import { resizeToJson } from '../../src/views/resize-json.ts';
import { renderResize } from '../../src/views/resize-table.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { renderSummary } from '../../src/views/summary.ts';
import { DATA, defaultTemplate, RUN, SAMPLE_CASES } from '../report/report-fixtures.ts';

const cases = [
  ...readdirSync(SAMPLE_CASES)
    .filter((f) => f.endsWith('.yaml'))
    .map((f) => join(SAMPLE_CASES, f)),
  join(DATA, 'two-sided-pump.yaml'),
];
const count = (text: string, part: string) => text.split(part).length - 1;

describe('one finding, the same in every view', () => {
  it.each(cases.map((p) => [basename(p), p]))('%s: check, resize, the report and every JSON give the same finding, once', (_name, path) => {
    const text = readFileSync(path, 'utf8');
    // Fewer samples than the case asks keep the test small; the views must agree whatever the count.
    const data = buildReportData(parseCase(text, basename(path)), { samples: 300 });
    const r = data.results;
    const f = r.finding;
    const sentence = findingSentence(f, r.case.units);

    const check = renderSummary(r);
    expect(count(check, `Finding: ${sentence}`)).toBe(1);
    expect(count(check, 'Finding:')).toBe(1);
    expect(check).not.toMatch(/Verdict/);

    const resize = renderResize(data.resize);
    expect(count(resize, sentence)).toBe(1);
    expect(resize).not.toMatch(/Verdict/);

    const source = { file: basename(path), text, sha256: '0'.repeat(64) };
    const md = renderReport(data, { run: RUN, source, figures: [], template: defaultTemplate() });
    const summary = md.slice(md.indexOf('\n## Incident finding\n'), md.indexOf('\n## ', md.indexOf('\n## Incident finding\n') + 1));
    expect(count(summary, `**Finding: ${sentence}**`)).toBe(1);
    expect(count(md, 'Finding:')).toBe(1);
    expect(md).not.toMatch(/Verdict:/);

    const json = [resultsToJson(r).finding, resizeToJson(data.resize).finding, reportJson(data, RUN, source).finding] as Record<string, unknown>[];
    for (const j of json) expect(j).toEqual(json[0]);
    expect(json[0]).toMatchObject({ verdict: f.verdict, basis: f.basis, side: f.side, yield_ratio: f.yieldRatio, peak_torque_Nm: f.peakTorque, disposition: f.disposition, sentence });
    expect(json[0]).toMatchObject({ action: f.action });
    expect(summary).toContain(f.disposition);
    for (const key of [
      'verdict',
      'basis',
      'basis_reason',
      'side',
      'segment',
      'peak_torque_Nm',
      'yield_ratio',
      'permanent_twist_rad',
      'break_time_s',
      'yield_probability',
      'yield_probability_interval',
      'probability_method',
      'disposition',
      'action',
    ]) {
      expect(json[0], key).toHaveProperty(key);
    }
    // The chance shown is the finding's own model's.
    if (r.uncertainty) {
      expect(f.chance?.model ?? r.verdictBasis).toBe(r.verdictBasis);
      if (f.chance) expect(json[0].yield_probability).toBe(f.chance.probability);
    } else {
      expect(json[0].yield_probability).toBeNull();
    }
  });
});
