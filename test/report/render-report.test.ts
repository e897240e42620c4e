import { describe, expect, it } from 'vitest';
import { drawFigures } from '../../src/report/draw-figures.ts';
import { REPORT_FIGURES, REPORT_SECTIONS } from '../../src/report/registry.ts';
import { renderReport } from '../../src/report/render-report.ts';
import type { ReportData } from '../../src/report/report-context.ts';
import { plasticPiecesTable } from '../../src/report/tables/plastic-pieces-table.ts';
import { plasticSidesTable } from '../../src/report/tables/plastic-sides-table.ts';
import { markdownTable } from '../../src/report/tables/report-table.ts';
import { show, sig } from '../../src/views/display-units.ts';
import { percent } from '../../src/views/finding-words.ts';
import { recommendedRemedy } from '../../src/views/remedy-words.ts';
import { anchorOf } from '../../src/report/anchor.ts';
import { escapeMarkdown } from '../../src/report/markdown-text.ts';
import { describePlasticPiece } from '../../src/views/plastic-lines.ts';
import { defaultTemplate, fixture, RUN } from './report-fixtures.ts';

function report(name: string, data = fixture(name).data) {
  const f = fixture(name);
  const figures = drawFigures(data);
  return { ...f, figures, md: renderReport(data, { run: RUN, source: f.source, figures, template: defaultTemplate() }) };
}

/** The Markdown between `## title` and the next `## `. */
function section(md: string, title: string): string {
  const start = md.indexOf(`\n## ${title}\n`);
  if (start < 0) throw new Error(`no section "${title}"`);
  const end = md.indexOf('\n## ', start + 1);
  return md.slice(start, end < 0 ? undefined : end);
}

const CASES = ['sample', 'two-sided-pump.yaml', 'elastic-fan.yaml', 'screw-conveyor-jam-us.yaml', 'exhaust-fan-seized-impeller.yaml'];
const HOW_SURE = 'How sure the finding is';
const FIRST = 'Incident finding';

describe('renderReport', () => {
  it.each(CASES)('renderReport(%s) has every section that applies once, in order, and the sign-off lines on the first page', (name) => {
    const { md, ctx } = report(name);
    const shown = REPORT_SECTIONS.filter((s) => s.render(ctx) !== undefined);
    const positions = shown.map((s) => md.indexOf(`\n## ${s.title}\n`));
    for (const [i, p] of positions.entries()) expect(p, shown[i].title).toBeGreaterThan(0);
    expect([...positions].sort((a, b) => a - b)).toEqual(positions);
    for (const s of shown) expect(md.split(`\n## ${s.title}\n`)).toHaveLength(2);
    expect(md.includes(`\n## ${HOW_SURE}\n`)).toBe(ctx.results.uncertainty !== undefined);
    expect(section(md, FIRST)).toContain('| Handed back to production by | | | |');
    expect(md).not.toMatch(/approved for return to service/i);
    // The body first, then every appendix: none of the body's sections after the first appendix.
    const titles = [...md.matchAll(/\n## (.*)\n/g)].map((m) => m[1]);
    const first = titles.findIndex((t) => t.startsWith('Appendix'));
    expect(titles.slice(first).every((t) => t.startsWith('Appendix'))).toBe(true);
  });

  it("every number in the incident finding is the finding's, the results object's or the resize result's, shown in the case's units", () => {
    for (const name of CASES) {
      const { results: r, md } = report(name);
      const u = r.case.units;
      const f = r.finding;
      const expected = [show(r.speed, 'speed', u, 4), ...r.sides.map((s) => show(s.kineticEnergy, 'energy', u)), sig(f.yieldRatio), describePlasticPiece(f, u)];
      const summary = section(md, FIRST);
      for (const e of expected) expect(summary, `${name}: ${e}`).toContain(e);
      // Conversely, every number in the summary comes from the finding, the energy method's side
      // figures (as a comparison), the incident's date, the machine's or the material's name.
      const finding = [
        show(f.peakTorque, 'torque', u),
        show(f.elasticPeakTorque, 'torque', u),
        f.permanentTwist === undefined ? '' : show(f.permanentTwist, 'angle', u),
        sig((f.breakTime ?? 0) * 1000),
        `kt ${sig(f.piece.segment.kt)}`,
        ...f.measured.flatMap((m) => [show(m.measured, 'angle', u), show(m.predicted, 'angle', u), m.speedForMeasured === undefined ? '' : show(m.speedForMeasured, 'speed', u, 4)]),
      ];
      const remedy = recommendedRemedy(report(name).data.resize);
      const comparison = [remedy?.action ?? '', remedy?.figure ?? '', remedy?.why ?? ''];
      const chance = f.chance ? [percent(f.chance.probability), String(f.chance.runs), String(f.chance.controlSamples ?? ''), ...f.chance.interval.map(percent)] : [];
      const context = [
        f.basisReason,
        f.disposition,
        r.case.meta.occurred ?? '',
        r.case.meta.machine ?? '',
        r.case.meta.investigator ?? '',
        r.case.meta.title ?? '',
        r.case.observed.key ?? '',
        r.case.observed.hub ?? '',
        ...r.case.stations.map((s) => s.name),
        ...r.case.shaft.segments.map((s) => s.label ?? String(s.index + 1)),
        r.case.materials[f.piece.segment.material].name,
      ];
      const allowed = new Set([...expected, ...finding, ...comparison, ...chance, ...context].flatMap((t) => t.match(/\d+(\.\d+)?/g) ?? []));
      for (const n of summary
        .replace(/side [AB]/g, '')
        .replace(/95 % interval/g, '')
        .match(/\d+(\.\d+)?/g) ?? [])
        expect(allowed, `${name}: ${n} in the incident finding`).toContain(n);
    }
  });

  it('the incident finding says what happened, then the one finding line, what was observed, the disposition and the remedy, each linked to its evidence', () => {
    const box = (name: string) => section(report(name).md, FIRST);
    const head = /^\n## Incident finding\n\n\*\*What happened\.\*\* .* stopped suddenly at .* while the shaft turned at .*\n\n/;
    expect(box('sample')).toMatch(
      new RegExp(
        `${head.source}> \\*\\*Finding: YIELDED THROUGH THE SECTION \\(dynamic model\\): .* capped at .* permanent twist of .*\\*\\* \\(\\[the evidence\\]\\(#results-of-the-governing-model\\)\\)`,
      ),
    );
    expect(box('sample')).toMatch(
      /\*\*Observed, against the model\*\* .*\n\n- Permanent twist drive sheave – rotor: measured 4°, the model gives 9\.98° at the recorded 420 rpm: less than the recorded speed explains; a stop from 279\.6 rpm would leave it\.\n- Fracture: none found; agrees with the model\./,
    );
    expect(box('sample')).toMatch(/\*\*Disposition: REPLACE THE SHAFT\.\*\* Not fit to return/);
    // The remedy is resize's pick (for the granulator a combination: every option alone has a flag), with its figure.
    expect(report('sample').data.resize.recommended?.option).toBe('limiter_setting');
    expect(box('sample')).toMatch(
      /\*\*Recommended remedy:\*\* Replace the shaft and fit a torque limiter at "drive sheave" set at 2140 N·m, the middle of its window .*\(\[what goes back in\]\(#recommendations-what-goes-back-in\)\)/,
    );
    const picked = CASES.filter((n) => report(n).data.resize.recommended);
    expect(picked.length).toBeGreaterThan(0);
    for (const n of picked) {
      const z = report(n).data.resize;
      expect(box(n)).toMatch(
        /\*\*Recommended remedy:\*\* .*Key figure: repeat-incident stress \/ shear yield [\d.]+ against the [\d.]+ allowed\. Why this one: .*\(\[what goes back in\]\(#recommendations-what-goes-back-in\)\)/,
      );
      expect(box(n)).toContain(escapeMarkdown(z.recommended!.reason.replace(/\.$/, '')));
    }
    expect(box('sample')).toMatch(
      /### Inspect at the critical location: "sheave seat", side A .*\n\n- ☐ Crack test of the keyseat under "drive sheave" and the fillets at the ends of "sheave seat" \(kt 2\.2\): magnetic particle/,
    );
    expect(box('sample')).toMatch(/### Before it runs again .*\n\n- ☐ The shaft is replaced/);
    expect(box('edger-arbor-two-sides.yaml')).toMatch(/> \*\*Finding: YIELDED THROUGH THE SECTION \(energy method\): /);
    expect(box('elastic-fan.yaml')).toMatch(/> \*\*Finding: ELASTIC \(energy method\): .* no yield is predicted\.\*\*/);
    expect(box('elastic-fan.yaml')).toMatch(/\*\*Disposition: RETURN TO SERVICE after the checks below\.\*\* May go back after inspection/);
    expect(box('exhaust-fan-seized-impeller.yaml')).toMatch(/> \*\*Finding: FRACTURE PREDICTED \(energy method\): .* breaks, at its fracture strain/);
    for (const name of CASES) {
      const { md } = report(name);
      expect(box(name).match(/Finding:|Verdict/g), name).toHaveLength(1);
      // Every link on the first page lands on a heading of the report.
      const anchors = new Set([...md.matchAll(/\n#{2,3} (.*)\n/g)].map((m) => anchorOf(m[1])));
      const links = [...box(name).matchAll(/\]\(#([^)]+)\)/g)].map((m) => m[1]);
      expect(links.length, name).toBeGreaterThan(3);
      for (const l of links) expect(anchors, `${name}: #${l}`).toContain(l);
    }
  });

  it("with tolerances the summary gives the chance of yield from the finding's own model", () => {
    const { md, results } = report('screw-conveyor-jam-us.yaml');
    expect(results.finding.basis).toBe('dynamic model');
    expect(results.finding.chance!.model).toBe('dynamic model');
    expect(section(md, FIRST)).toContain(`Chance of yield under the case's tolerances: ${percent(results.finding.chance!.probability)} %`);
    expect(section(md, FIRST)).toContain(`runs of the dynamic model`);
  });

  it("the findings are one section: the models' numbers, past yield, the measured twist read back and the fracture reading; no verdict of its own", () => {
    const { md, results } = report('exhaust-fan-seized-impeller.yaml');
    const findings = section(md, 'Findings');
    expect(md.match(/\n## Findings\n/g)).toHaveLength(1);
    expect(findings).toMatch(/^\n## Findings\n\n- The finding \(page 1\) stands on the energy method/);
    expect(findings).not.toMatch(/Verdict|Finding:/);
    for (const h of ['### Past yield', '### Measured permanent twist, read back to the stop', '### Fracture']) expect(findings).toContain(h);
    expect(findings).toContain('like for like (both elastic)');
    expect(findings).toContain(markdownTable(plasticSidesTable(results)));
    expect(findings).toContain(markdownTable(plasticPiecesTable(results)!));
    expect(findings).toMatch(/\*\*Agrees with the prediction\.\*\*/);
    expect(findings).not.toContain('### Cautions');
  });

  it('a case with tolerances has the section "How sure the finding is" with every part the investigator needs', () => {
    const { md, results } = report('screw-conveyor-jam-us.yaml');
    const u = results.uncertainty!;
    const s = section(md, HOW_SURE);
    expect(s).toContain(`repeated ${u.samples} times (a seeded Monte Carlo, seed ${u.seed})`);
    expect(s).toContain('A stated ± band is taken as two standard deviations of a normal distribution');
    expect(s).toContain('A handbook minimum strength is taken as the 5th percentile of a normal distribution with a coefficient of variation of 7 %');
    expect(s).toContain(`| stress / shear yield (elastic method, kt applied) | — | ${sig(results.yieldRatio)} | ${u.percentiles.yieldRatio.map((v) => sig(v)).join(' | ')} |`);
    expect(s).toContain(`**Chance of yield under the case's tolerances: ${percent(results.finding.chance!.probability)} %`);
    expect(s).toContain(`${sig(100 * u.yieldProbability, 3)} % of the ${u.samples} samples`);
    expect(s).toContain(`| 1 | yield strength of aisi-1045-cd | ${sig(u.sensitivity[0].low)} | ${sig(u.sensitivity[0].high)} |`);
    expect(s).toMatch(/\*\*Yield strength of aisi-1045-cd moves stress \/ shear yield most \(from .* across its band\): measure it better first\.\*\*/);
    expect(s).toContain('](figures/uncertainty-yield-ratio.svg)');
    expect(s).toContain('](figures/uncertainty-sensitivity.svg)');
  });

  it('the speed interval behind a measured twist is stated with whether the recorded speed lies inside', () => {
    const { md, results } = report('exhaust-fan-seized-impeller.yaml');
    expect(results.uncertainty!.observed).toHaveLength(1);
    // The twist measured between the bearings is zero and that shaft never yields: it cannot bound the speed.
    expect(section(md, HOW_SURE)).toContain(
      'Twist between "drive-end bearing" and "non-drive bearing": none was measured, and the shaft between these stations does not yield at any speed, so the measurement does not bound the speed.',
    );
  });

  it('the recommendations carry what goes back in from the resize result given, computing nothing again', () => {
    const { data, md } = report('sample');
    expect(md.match(/\n## Recommendations: what goes back in\n/g)).toHaveLength(1);
    expect(md).not.toContain('## What goes back in');
    const rec = section(md, 'Recommendations: what goes back in');
    expect(rec).toContain('| Option |');
    expect(rec).toContain('### Guarding and restart');
    // A resize result with a marked guarding line shows that line: the section reads what it is given.
    const marked: ReportData = { ...data, resize: { ...data.resize, guarding: [{ topic: 'Marker', text: 'given, not recomputed' }] } };
    expect(section(report('sample', marked).md, 'Recommendations: what goes back in')).toContain('- Marker: given, not recomputed');
  });

  it('each figure is linked once, in the section the registry names, numbered in the order they appear', () => {
    const { md, figures } = report('two-sided-pump.yaml');
    expect(figures.map((f) => f.figure.name)).toEqual([
      'shaft-schematic',
      'energy-share',
      'stress-along-shaft',
      'stress-vs-speed',
      'dynamic-torque',
      'dynamic-speeds',
      'dynamic-modes',
      'torque-twist',
      'resize-yield-ratio-vs-diameter',
      'resize-peak-torque-vs-limiter',
    ]);
    for (const f of figures) {
      const title = REPORT_SECTIONS.find((s) => s.id === f.section)!.title;
      expect(section(md, title)).toMatch(new RegExp(`!\\[Figure \\d+: ${f.figure.title.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}\\.`));
      expect(md.split(`](figures/${f.figure.name}.svg)`)).toHaveLength(2);
    }
    const numbers = [...md.matchAll(/!\[Figure (\d+):/g)].map((m) => Number(m[1]));
    expect(numbers).toEqual(figures.map((_, i) => i + 1));
    // The finding's model's figures are in the body, the other model's in the comparison appendix.
    const where = (name: string, names: string[]) => names.map((n) => report(name).figures.find((f) => f.figure.name === n)!.section);
    expect(report('edger-arbor-two-sides.yaml').results.finding.basis).toBe('energy method');
    expect(where('edger-arbor-two-sides.yaml', ['stress-along-shaft', 'dynamic-torque', 'dynamic-modes'])).toEqual(['results', 'comparison', 'comparison']);
    expect(report('sample').results.finding.basis).toBe('dynamic model');
    expect(where('sample', ['stress-along-shaft', 'dynamic-torque', 'dynamic-modes'])).toEqual(['comparison', 'results', 'dynamics']);
  });

  it('the figures of past yield, the measured twist and the uncertainty run are drawn only where there is data', () => {
    const names = (n: string) => report(n).figures.map((f) => f.figure.name);
    expect(names('elastic-fan.yaml')).not.toContain('torque-twist');
    expect(names('elastic-fan.yaml').some((n) => n.startsWith('uncertainty-'))).toBe(false);
    expect(names('screw-conveyor-jam-us.yaml')).toEqual(expect.arrayContaining(['uncertainty-yield-ratio', 'uncertainty-sensitivity']));
    expect(names('exhaust-fan-seized-impeller.yaml')).toContain('torque-twist');
    expect(names('sample')).toContain('permanent-twist-speed-1');
  });

  it('every registered figure names a registered section, for every case', () => {
    const ids = REPORT_SECTIONS.map((s) => s.id);
    for (const name of CASES) for (const f of REPORT_FIGURES) expect(ids).toContain(typeof f.section === 'string' ? f.section : f.section(fixture(name).data));
  });

  it('the cautions, the sources of every material used and the case text appear in the report', () => {
    const { md, results, source } = report('two-sided-pump.yaml');
    for (const c of results.cautions) expect(section(md, 'Cautions')).toContain(c);
    for (const m of Object.values(results.case.materials)) expect(section(md, 'Appendix: materials and sources')).toContain(m.key);
    expect(section(md, 'Appendix: inputs as given')).toContain(source.text.trim());
    expect(md).toContain(source.sha256);
  });

  it('the sources list the formulas past yield, of the fracture, the key, the drive and the Monte Carlo', () => {
    const sources = section(report('sample').md, 'Appendix: materials and sources');
    // Each source named once, what was entered from memory said once (the library keeps its per-value flags).
    expect(sources.match(/from memory/gi)).toHaveLength(1);
    expect(sources).toContain(
      "AISI 1045 steel, cold drawn (aisi-1045-cd): strengths: Shigley 9th ed. Table A-20, estimated ASTM minimum; elastic constants (E, G, Poisson's ratio) and density: Shigley 9th ed. Table A-5. (†)",
    );
    for (const s of [
      'Beer & Johnston, Mechanics of Materials, Sec. 3.9–3.11',
      'Dieter, Mechanical Metallurgy, 3rd ed., Sec. 8-3',
      'ASM Handbook Vol. 11',
      'Shigley 9th ed., Sec. 7-7',
      'T = P/ω',
      'mulberry32',
      'Box & Muller',
      'Hyndman & Fan',
    ])
      expect(sources).toContain(s);
    // The sample (the granulator) has no fit and no gearbox: their formulas are not the report's.
    expect(report('sample').data.results.fits).toHaveLength(0);
    for (const s of ['Lamé', 'thick-walled cylinders', 'Lewis equation', "gear unit's efficiency"]) expect(sources).not.toContain(s);
  });

  it("the method lists the engine's warnings and the assumptions past yield", () => {
    const { md, results } = report('two-sided-pump.yaml');
    expect(results.warnings.length).toBeGreaterThan(0);
    const method = section(md, 'Appendix: method and assumptions');
    for (const w of results.warnings) expect(method).toContain(w);
    for (const a of results.plastic.assumptions) expect(method).toContain(a);
  });

  it('the Markdown report of the two-sided US case matches its snapshot', () => {
    expect(report('two-sided-pump.yaml').md).toMatchSnapshot();
  });
});
