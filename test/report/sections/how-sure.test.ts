import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../../src/case/parse-case.ts';
import { buildReportData, type ReportDataOptions } from '../../../src/report/build-report-data.ts';
import { howSureSection } from '../../../src/report/sections/how-sure.ts';
import { show, sig } from '../../../src/views/display-units.ts';
import { ep5CaseText } from '../../data/ep5-case.ts';
import { fixture, RUN } from '../report-fixtures.ts';

const granulator = readFileSync(new URL('../../../sample-cases/granulator-tramp-metal.yaml', import.meta.url), 'utf8');
const source = { file: 'c.yaml', text: '', sha256: '0'.repeat(64) };

function render(text: string, opts: ReportDataOptions = { samples: 2000 }) {
  const data = buildReportData(parseCase(text), opts);
  return { r: data.results, md: howSureSection.render({ ...data, run: RUN, source }) };
}

describe('howSureSection', () => {
  it('howSureSection is left out without an uncertainty run: no tolerances, or --samples 0', () => {
    expect(howSureSection.render(fixture('elastic-fan.yaml').ctx)).toBeUndefined();
    expect(render(granulator.replace(/^speed: 420 rpm.*$/m, 'speed: 420 rpm ± 5 %'), { samples: 0 }).md).toBeUndefined();
  });

  it('howSureSection gives the interval of speeds behind a measured twist and whether the recorded speed lies inside (read-back on the energy balance)', () => {
    const { r, md } = render(granulator.replace(/^speed: 420 rpm.*$/m, 'speed: 420 rpm ± 5 %') + '\nanalysis:\n  dynamic_plasticity: false\n');
    const o = r.uncertainty!.observed[0];
    expect(o.speedInterval).not.toBeNull();
    const [lo, hi] = o.speedInterval!;
    expect(md).toContain(
      `Twist between "drive sheave" and "rotor": a stop from ${show(lo, 'speed', 'metric', 4)} to ${show(hi, 'speed', 'metric', 4)} (5–95 %) explains it; the recorded 420 rpm lies ${o.recordedInside ? 'inside' : 'outside'} that interval.`,
    );
    // An independent look at the same numbers: 420 rpm is far above a 4° twist's speeds, so outside.
    expect(o.recordedInside).toBe(false);
    expect(md).toContain(`| speed | speed | normal; the stated ± band is 2σ | rpm | 420 | ${sig((0.05 * 420) / 2)} | 2.5 |`);
  });

  it('howSureSection names a typical strength as the mean, and says when strengths are not varied', () => {
    // EP5's material is the case's own with no strength basis, so it is taken as typical.
    const typical = render(ep5CaseText({ speed: '300 rpm ± 4 %' })).md!;
    expect(typical).toContain("A typical strength (or a case material's, unless it says strength_basis: minimum) is taken as the mean of a normal distribution with a coefficient of variation of 7 %");
    expect(typical).not.toContain('handbook minimum');
    const none = render(ep5CaseText({ speed: '300 rpm ± 4 %', analysis: ['strength_scatter: 0 %'] })).md!;
    expect(none).toContain('Material strengths are not varied (analysis.strength_scatter is 0 %).');
    expect(none).not.toContain('typical strength');
  });

  it('howSureSection ends with the ranked inputs and the one-line finding', () => {
    const { r, md } = render(ep5CaseText({ speed: '300 rpm ± 4 %' }));
    const top = r.uncertainty!.sensitivity[0];
    expect(md).toMatch(/\*\*Which input matters most\*\*\n\n\| rank \| input \|/);
    expect(md!.trimEnd().split('\n').pop()).toMatch(
      new RegExp(
        `^\\*\\*[A-Z].* moves stress / shear yield most \\(from ${sig(top.low).replace('.', '\\.')} to ${sig(top.high).replace('.', '\\.')} across its band\\): measure it better first\\.\\*\\*$`,
      ),
    );
  });
});
