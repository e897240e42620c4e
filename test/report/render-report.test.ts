import { describe, expect, it } from 'vitest';
import { drawFigures } from '../../src/report/draw-figures.ts';
import { REPORT_FIGURES, REPORT_SECTIONS } from '../../src/report/registry.ts';
import { renderReport } from '../../src/report/render-report.ts';
import { show, sig } from '../../src/views/display-units.ts';
import { describePiece } from '../../src/views/summary.ts';
import { defaultTemplate, fixture, RUN } from './report-fixtures.ts';

function report(name: string) {
  const f = fixture(name);
  const figures = drawFigures(f.results);
  return { ...f, figures, md: renderReport(f.results, { run: RUN, source: f.source, figures, template: defaultTemplate() }) };
}

/** The Markdown between `## title` and the next `## `. */
function section(md: string, title: string): string {
  const start = md.indexOf(`\n## ${title}\n`);
  if (start < 0) throw new Error(`no section "${title}"`);
  const end = md.indexOf('\n## ', start + 1);
  return md.slice(start, end < 0 ? undefined : end);
}

describe('renderReport', () => {
  it.each(['sample', 'two-sided-pump.yaml', 'elastic-fan.yaml'])('renderReport(%s) has every registered section once, in order, and the sign-off', (name) => {
    const { md } = report(name);
    const positions = REPORT_SECTIONS.map((s) => md.indexOf(`\n## ${s.title}\n`));
    for (const [i, p] of positions.entries()) expect(p, REPORT_SECTIONS[i].title).toBeGreaterThan(0);
    expect([...positions].sort((a, b) => a - b)).toEqual(positions);
    for (const s of REPORT_SECTIONS) expect(md.split(`\n## ${s.title}\n`)).toHaveLength(2);
    expect(md).toContain('\n## Sign-off\n');
  });

  it('every number in the summary is one of the results object\'s, shown in the case\'s units', () => {
    for (const name of ['sample', 'two-sided-pump.yaml', 'elastic-fan.yaml']) {
      const { results: r, md } = report(name);
      const u = r.case.units;
      const g = r.governing.piece;
      const expected = [
        show(r.speed, 'speed', u, 4),
        ...r.sides.flatMap((s) => [show(s.kineticEnergy, 'energy', u), show(s.peakTorque, 'torque', u), show(s.twist, 'angle', u)]),
        show(g.shearStress, 'stress', u),
        show(g.shearYield, 'stress', u),
        sig(r.yieldRatio),
        describePiece(g, u),
        ...(r.verdict === 'elastic' ? [`${sig(100 * r.yieldRatio)} %`] : []),
      ];
      const summary = section(md, 'Summary');
      for (const e of expected) expect(summary, `${name}: ${e}`).toContain(e);
      // Conversely, every number in the summary comes from those values, the incident's date, the machine's or the material's name.
      const allowed = new Set([...expected, r.case.meta.occurred ?? '', r.case.meta.machine ?? '', r.case.materials[g.piece.segment.material].name, String(r.warnings.length)].flatMap((t) => t.match(/\d+(\.\d+)?/g) ?? []));
      for (const n of summary.replace(/side [AB]/g, '').match(/\d+(\.\d+)?/g) ?? []) expect(allowed, `${name}: ${n} in the summary`).toContain(n);
    }
  });

  it('the summary states the verdict in plain words for both verdicts', () => {
    expect(section(report('sample').md, 'Summary')).toMatch(/\*\*Verdict \(elastic energy method\):\*\* YIELDED: .*\n>\n> The shaft cannot have stayed elastic/);
    expect(section(report('elastic-fan.yaml').md, 'Summary')).toMatch(/\*\*Verdict \(elastic energy method\):\*\* ELASTIC: .*\n>\n> The shaft can have stayed elastic/);
  });

  it('each figure is linked once, numbered in order, in the section the registry names', () => {
    const { md, figures } = report('two-sided-pump.yaml');
    expect(figures.map((f) => f.figure.name)).toEqual(['shaft-schematic', 'energy-share', 'stress-along-shaft', 'stress-vs-speed']);
    figures.forEach((f, i) => {
      const title = REPORT_SECTIONS.find((s) => s.id === f.section)!.title;
      expect(section(md, title)).toContain(`![Figure ${i + 1}: ${f.figure.title}.`);
      expect(md.split(`](figures/${f.figure.name}.svg)`)).toHaveLength(2);
    });
  });

  it('every registered figure names a registered section', () => {
    const ids = REPORT_SECTIONS.map((s) => s.id);
    for (const f of REPORT_FIGURES) expect(ids).toContain(f.section);
  });

  it('the cautions, the sources of every material used and the case text appear in the report', () => {
    const { md, results, source } = report('two-sided-pump.yaml');
    for (const c of results.cautions) expect(section(md, 'Cautions')).toContain(c);
    for (const m of Object.values(results.case.materials)) expect(section(md, 'Sources')).toContain(m.key);
    expect(section(md, 'Appendix: inputs as given')).toContain(source.text.trim());
    expect(md).toContain(source.sha256);
  });

  it('the method lists the engine\'s warnings', () => {
    const { md, results } = report('two-sided-pump.yaml');
    expect(results.warnings.length).toBeGreaterThan(0);
    for (const w of results.warnings) expect(section(md, 'Method and assumptions')).toContain(w);
  });

  it('the Markdown report of the two-sided US case matches its snapshot', () => {
    expect(report('two-sided-pump.yaml').md).toMatchSnapshot();
  });
});
