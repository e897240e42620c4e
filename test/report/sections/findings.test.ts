import MarkdownIt from 'markdown-it';
import { describe, expect, it } from 'vitest';
import { buildReportData } from '../../../src/report/build-report-data.ts';
import { findingsSection } from '../../../src/report/sections/findings.ts';
import { ep5Case } from '../../data/ep5-case.ts';
import { RUN } from '../report-fixtures.ts';

// The report's own markdown-it settings have html off; html on here makes the escaping check stronger
// (linkify stays off, as in the report: it would turn any plain "example.com" into a link).
const md = new MarkdownIt({ html: true, linkify: false });
const hostile = '<script>alert(1)</script> *bold* [link](http://example.com) | cell `code` _x_ ~~y~~ & more';

function render(observed: string[]) {
  const data = buildReportData(ep5Case({ observed }));
  const text = findingsSection.render({ ...data, run: RUN, source: { file: 'ep5.yaml', text: '', sha256: '0'.repeat(64) } })!;
  return { r: data.results, text, html: md.render(text) };
}

describe('findingsSection', () => {
  const { r, text, html } = render([
    'permanent_twist:',
    `  - { between: [seized bearing, disc], angle: 0.5 deg, method: "${hostile}" }`,
    'fracture: { type: fatigue, at: disc, notes: "# not a heading" }',
  ]);

  it("findingsSection opens with the finding's model, states no verdict of its own, and has its parts as sub-headings, no cautions of its own", () => {
    expect(text).toMatch(/^- The finding \(page 1\) stands on the energy method; past yield on the energy balance\./);
    expect(text).not.toMatch(/Verdict|Finding:/);
    for (const h of ['Past yield', 'Measured permanent twist, read back to the stop', 'Fracture']) expect(html).toContain(`<h3>${h}</h3>`);
    expect(html).not.toContain('<h3>Cautions</h3>');
    expect(html).not.toContain('<h2>');
  });

  it("findingsSection gives the energy method's numbers per side, and the tables past yield", () => {
    expect(text).toMatch(/- Energy method, side B \(disc\): elastic peak torque .*, stress \/ shear yield [\d.]+\./);
    expect(html).toMatch(/<table>[\s\S]*permanent twist[\s\S]*<\/table>/);
    expect(text).toContain('**The pieces that went past yield**');
    expect(text).toContain(`| ${r.plastic.sides[0].side} | 1 |`);
  });

  it('findingsSection gives the read-back row with its finding, and the fracture reading with its source and caution', () => {
    expect(text).toMatch(/\| seized bearing – disc \| 0\.5° \|/);
    expect(text).toMatch(/Less than the recorded speed explains/);
    expect(text).toMatch(/ASM Handbook Vol\. 11/);
    expect(html).toMatch(/<blockquote>[\s\S]*qualified failure examiner/);
  });

  it('findingsSection escapes user text: no HTML, link, emphasis or code from the case file survives, and lines cannot start a block', () => {
    expect(html).not.toMatch(/<script>/);
    expect(html).not.toMatch(/<a /);
    expect(html).not.toMatch(/<em>|<strong>x|<code>|<s>/);
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(html).not.toMatch(/<h1>/);
    expect(html).toContain('# not a heading');
  });

  it('findingsSection of an elastic stop says no permanent twist is predicted and shows no piece table', () => {
    const elastic = render([]);
    const slow = buildReportData(ep5Case({ speed: '20 rpm' }));
    const md2 = findingsSection.render({ ...slow, run: RUN, source: { file: 'ep5.yaml', text: '', sha256: '0'.repeat(64) } })!;
    expect(slow.results.verdict).toBe('elastic');
    expect(slow.results.finding.verdict).toBe('elastic');
    expect(md2).toContain('No piece of shaft passes yield over its net section: no permanent twist is predicted.');
    expect(md2).not.toContain('went past yield');
    expect(md2).not.toContain('### Measured permanent twist');
    expect(elastic.text).not.toContain('### Fracture');
  });
});

describe('findingsSection on a brittle shaft whose verdict past yield stands on the dynamic model', () => {
  it('says its pieces break at their fracture stress, not that they yield', () => {
    const c = ep5Case({ material: ['shear_modulus: 41.4 GPa', 'yield_strength: 207 MPa', 'tensile_strength: 207 MPa', 'elongation: 0.5 %', 'density: 7197 kg/m^3'] });
    const data = buildReportData({ ...c, stop: { ...c.stop, duration: 0.0005 } });
    const text = findingsSection.render({ ...data, run: RUN, source: { file: 'gray.yaml', text: '', sha256: '0'.repeat(64) } })!;
    expect(data.results.pastYieldBasis).toBe('dynamic model');
    expect(text).toMatch(/brittle pieces elastic up to their fracture stress/);
    expect(text).not.toMatch(/its shaft elements yield as the net section does/);
  });
});
