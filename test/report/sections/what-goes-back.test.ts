import MarkdownIt from 'markdown-it';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../../src/case/parse-case.ts';
import { analyseCase } from '../../../src/results/analyse-case.ts';
import { CAUTIONS } from '../../../src/results/cautions.ts';
import { resizeCase } from '../../../src/resize/resize-case.ts';
import { renderResizeSection } from '../../../src/report/sections/what-goes-back.ts';
import { optionRows } from '../../../src/views/resize-rows.ts';

const section = (text: string) => {
  const c = parseCase(text);
  const r = analyseCase(c);
  const z = resizeCase(c, r);
  return { z, md: renderResizeSection(r, z) };
};
const granulator = readFileSync(new URL('../../../sample-cases/granulator-tramp-metal.yaml', import.meta.url), 'utf8');

describe('the report section "What goes back in"', () => {
  it('carries the options table, one row per option, and the guarding recommendations and cautions', () => {
    const { z, md } = section(granulator);
    expect(md).toMatch(/^## What goes back in/);
    const rows = md.split('\n').filter((l) => l.startsWith('| '));
    expect(rows).toHaveLength(optionRows(z).length + 2); // headings, rule, one row per option
    expect(md).toMatch(/### Guarding and restart/);
    expect(md).toMatch(/ring-tested/);
    for (const c of CAUTIONS) expect(md).toContain(c.slice(0, 40));
  });

  it('renders to HTML with one table of the options', () => {
    const html = new MarkdownIt().render(section(granulator).md);
    expect(html.match(/<table>/g)).toHaveLength(1);
    expect(html).toMatch(/<td>Torque limiter at &quot;drive sheave&quot;<\/td>/);
  });

  it('escapes the case\'s own text: names and labels cannot break the table or add markup', () => {
    const text = granulator.replaceAll('drive sheave', 'sheave | *main* <b>').replace('label: sheave seat', 'label: "seat_[1]"');
    const html = new MarkdownIt().render(section(text).md);
    expect(html).toContain('Torque limiter at &quot;sheave | *main* &lt;b&gt;&quot;');
    expect(html).not.toMatch(/<b>|<em>main/);
    expect(html).toContain('seat_[1]');
    const table = html.slice(html.indexOf('<table>'), html.indexOf('</table>'));
    for (const row of table.split('<tr>').slice(2)) expect(row.match(/<td>/g)).toHaveLength(6);
  });
});
