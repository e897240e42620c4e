import MarkdownIt from 'markdown-it';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../../src/case/parse-case.ts';
import { buildReportData } from '../../../src/report/build-report-data.ts';
import { optionsSection, recommendationsSection } from '../../../src/report/sections/recommendations.ts';
import { optionRows } from '../../../src/views/resize-rows.ts';
import { RUN } from '../report-fixtures.ts';

const section = (text: string) => {
  const data = buildReportData(parseCase(text));
  return { z: data.resize, md: recommendationsSection.render({ ...data, run: RUN, source: { file: 'c.yaml', text, sha256: '0'.repeat(64) } })! };
};
const granulator = readFileSync(new URL('../../../sample-cases/granulator-tramp-metal.yaml', import.meta.url), 'utf8');

describe('the report section "Recommendations: what goes back in"', () => {
  it('carries the options table, one row per option, and the guarding recommendations', () => {
    const { z, md } = section(granulator);
    const rows = md.split('\n').filter((l) => l.startsWith('| '));
    expect(rows).toHaveLength(optionRows(z).length + 2); // headings, rule, one row per option
    expect(md).toMatch(/### Guarding and restart/);
    expect(md).toMatch(/Restart to a written procedure/);
    expect(md).not.toMatch(/ring-tested/);
    expect(md).toMatch(/\*\*Recommended: fit a torque limiter at "drive sheave" set at 2140 N·m/);
    expect(md).toContain('[see the appendix](#appendix-every-option-for-what-goes-back-in)');
  });

  it('the appendix of every option says each in words, and what the options rest on', () => {
    const data = buildReportData(parseCase(granulator));
    const md = optionsSection.render({ ...data, run: RUN, source: { file: 'c.yaml', text: granulator, sha256: '0'.repeat(64) } })!;
    for (const h of [
      '### Flagged: why these options are not advisable',
      '### Scale the side',
      '### Resize the critical segment only',
      '### Another material',
      '### Torque limiter or slip coupling',
      '### The key as fuse at "drive sheave"',
      '### What the options rest on',
    ])
      expect(md).toContain(h);
  });

  it('ends with what the investigator decides, and for a yielded shaft the return-to-service caution', () => {
    const { md } = section(granulator);
    expect(md.trimEnd().split('\n').pop()).toBe(
      '*The investigator decides which option goes back in, with the machine builder, and records the return-to-service decision. A shaft that may have yielded is not returned to service on a calculation alone.*',
    );
  });

  it('renders to HTML with one table of the options', () => {
    const html = new MarkdownIt().render(section(granulator).md);
    expect(html.match(/<table>/g)).toHaveLength(1);
    expect(html).toMatch(/<td>Torque limiter at &quot;drive sheave&quot; \(flagged\)<\/td>/);
  });

  it("escapes the case's own text: names and labels cannot break the table or add markup", () => {
    const text = granulator.replaceAll('drive sheave', 'sheave | *main* <b>').replace('label: sheave seat', 'label: "seat_[1]"');
    const html = new MarkdownIt().render(section(text).md);
    expect(html).toContain('Torque limiter at &quot;sheave | *main* &lt;b&gt;&quot;');
    expect(html).not.toMatch(/<b>|<em>main/);
    expect(html).toContain('seat_[1]');
    const table = html.slice(html.indexOf('<table>'), html.indexOf('</table>'));
    for (const row of table.split('<tr>').slice(2)) expect(row.match(/<td>/g)).toHaveLength(6);
  });
});
