import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from './problems.ts';

const base = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');

describe('parseCase reports each mistake with file:line:column, the field path and an example', () => {
  it('accepts the fixture', () => {
    expect(parseCase(base).stations).toHaveLength(2);
  });

  it('YAML syntax', () => {
    const text = base.replace('  id: T-1', '  id: [T-1');
    expect(problems(text)[0]).toMatch(/^case\.yaml:\d+:\d+: not valid YAML/);
  });

  it('an unknown key, with a did-you-mean', () => {
    const text = base.replace('      diameter: 50 mm', '      diametre: 60 mm');
    const line = lineOf(text, 'diametre');
    const msgs = problems(text);
    expect(msgs).toContainEqual(expect.stringMatching(new RegExp(`^case\\.yaml:${line}:7 shaft\\.segments\\[0\\]\\.diametre: unknown key; did you mean "diameter"\\?`)));
  });

  it('a comma inside a value of a { … } mapping: the rest reads as a key, and the message says to quote the value', () => {
    const text = `${base.trimEnd()}\nobserved:\n  permanent_twist:\n    - { between: [jam, flywheel], angle: 2 deg, method: keyway offset, read with a protractor }\n`;
    const msgs = problems(text);
    expect(msgs).toContainEqual(
      expect.stringMatching(
        /observed\.permanent_twist\[0\]\.read with a protractor: unknown key; a comma inside a \{ … \} mapping ends a value, so "read with a protractor" reads as a key; if it belongs to method, put the whole value in quotes: method: "keyway offset, read with a protractor"$/,
      ),
    );
    // Quoted, it reads.
    const quoted = text.replace('method: keyway offset, read with a protractor', 'method: "keyway offset, read with a protractor"');
    expect(parseCase(quoted).observed.permanentTwist[0].method).toBe('keyway offset, read with a protractor');
  });

  it('a missing unit', () => {
    const text = base.replace('diameter: 50 mm', 'diameter: 50');
    const line = lineOf(text, 'diameter: 50');
    expect(problems(text)).toContainEqual(`case.yaml:${line}:17 shaft.segments[0].diameter: "50" has no unit; give a length such as "40 mm" or "1.5 in"`);
  });

  it('a unit of the wrong kind', () => {
    const text = base.replace('length: 800 mm', 'length: 800 MPa');
    expect(problems(text).join('\n')).toMatch(new RegExp(`case\\.yaml:${lineOf(text, '800 MPa')}:\\d+ shaft\\.segments\\[0\\]\\.length: "800 MPa" is stress, not length`));
  });

  it('a zero or negative length', () => {
    const zero = base.replace('length: 800 mm', 'length: 0 mm');
    expect(problems(zero).join('\n')).toMatch(new RegExp(`:${lineOf(zero, 'length: 0 mm')}:\\d+ shaft\\.segments\\[0\\]\\.length: "0 mm" must be greater than zero`));
    const neg = base.replace('diameter: 50 mm', 'diameter: -50 mm');
    expect(problems(neg).join('\n')).toMatch(/shaft\.segments\[0\]\.diameter: "-50 mm" must be greater than zero/);
  });

  it('a bore not smaller than its diameter', () => {
    const text = base.replace('      diameter: 50 mm', '      diameter: 50 mm\n      bore: 50 mm');
    expect(problems(text).join('\n')).toMatch(new RegExp(`:${lineOf(text, 'bore: 50 mm')}:\\d+ shaft\\.segments\\[0\\]\\.bore: the bore must be smaller than the diameter`));
  });

  it('a station off the shaft', () => {
    const text = base.replace('at: 800 mm', 'at: 900 mm');
    expect(problems(text).join('\n')).toMatch(new RegExp(`:${lineOf(text, 'at: 900 mm')}:\\d+ stations\\[1\\]\\.at: lies off the shaft, which is 800 mm long`));
  });

  it('an unknown station name at the stop', () => {
    const text = base.replace('  at: jam', '  at: jamm');
    expect(problems(text).join('\n')).toMatch(new RegExp(`:${lineOf(text, 'at: jamm')}:\\d+ stop\\.at: no station is named "jamm"; give one of "jam", "flywheel"`));
  });

  it('an unknown material, with a did-you-mean', () => {
    const text = base.replace('material: aisi-1045-cd', 'material: aisi-1045-dc');
    expect(problems(text).join('\n')).toMatch(/shaft\.material: unknown material "aisi-1045-dc"; did you mean "aisi-1045-cd"\?/);
  });

  it('a case material without the property its use needs', () => {
    const text = base.replace('material: aisi-1045-cd', 'material: mystery').replace('units: metric', 'units: metric\nmaterials:\n  mystery:\n    shear_modulus: 80 GPa');
    expect(problems(text).join('\n')).toMatch(/shaft\.material: material "mystery" has no yield_strength, which this use needs; add it under materials\.mystery, e\.g\. yield_strength: "530 MPa"/);
  });

  it('a wrong type', () => {
    const text = base.replace('  segments:\n', '  segments: two\n').replace(/    - length[\s\S]*?diameter: 50 mm\n/, '');
    expect(problems(text).join('\n')).toMatch(/shaft\.segments: should be a list/);
  });

  it('a missing required field', () => {
    const text = base.replace('  id: T-1', '  title: no id');
    expect(problems(text).join('\n')).toMatch(/case\.id: is required; give an incident id such as "INC-2026-014"/);
  });

  it('a disc with neither material nor density', () => {
    const text = base.replace(/      - shape: mass[\s\S]*$/, '      - shape: disc\n        diameter: 400 mm\n        thickness: 50 mm\n');
    expect(problems(text).join('\n')).toMatch(/stations\[1\]\.parts\[0\]\.material: a disc needs material/);
  });

  it('nothing turning is a modelling error', () => {
    const text = base.replace(/    parts:[\s\S]*$/, '');
    expect(problems(text).join('\n')).toMatch(/stations: no station away from the one that stopped carries parts/);
  });

  it("parts only at the stop's own position are a modelling error too, not a crash", () => {
    const text = base.replace('    at: 800 mm', '    at: 0 mm');
    expect(problems(text).join('\n')).toMatch(/stations: no station away from the one that stopped carries parts/);
  });

  it('reports every mistake at once', () => {
    const text = base.replace('diameter: 50 mm', 'diameter: 50').replace('speed: 150 rpm', 'speed: 150').replace('  at: jam', '  at: nowhere');
    const msgs = problems(text);
    expect(msgs.length).toBeGreaterThanOrEqual(3);
    expect(msgs.some((m) => m.includes('speed:'))).toBe(true);
    expect(msgs.some((m) => m.includes('shaft.segments[0].diameter'))).toBe(true);
  });

  it('photo paths outside the case folder are refused', () => {
    const text = base + 'observed:\n  photos:\n    - path: ../../etc/passwd\n';
    expect(problems(text).join('\n')).toMatch(/observed\.photos\[0\]\.path: "\.\.\/\.\.\/etc\/passwd" points outside the case folder/);
  });

  it('a value holding a line break (an empty line inside a plain value) is quoted on one line, so each problem stays one line', () => {
    // Found by the fuzz (seed 99, input 872): "at: jam" followed by an empty line and a deeper
    // indented word folds into "jam\npar", and the message quoting it spanned two lines.
    const text = base.replace('  at: jam', '  at: jam\n\n    par');
    const msgs = problems(text);
    expect(msgs).toContainEqual(`case.yaml:${lineOf(text, 'at: jam')}:7 stop.at: no station is named "jam\\npar"; give one of "jam", "flywheel"`);
    for (const m of msgs) expect(m).toMatch(/^case\.yaml:\d+:\d+ \S+: /);
  });
});
