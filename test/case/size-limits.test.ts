import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SIZE_LIMITS } from '../../src/case/limits.ts';
import { lineOf, problems } from '../helpers/case-problems.ts';

const base = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');

describe('parseCase bounds the work before it starts', () => {
  it('a case file over 1 MB is refused before it is parsed', () => {
    const big = base + `# ${'x'.repeat(SIZE_LIMITS.fileBytes)}\n`;
    expect(problems(big)).toMatch(/^case\.yaml: the case file is 1\.00 MB, more than the 1 MB a case file may be/);
  });

  it('30 000 keys are refused by a count of the colons before the file is parsed, a mapping of 1500 at its first key', () => {
    // Refused before the YAML parser sees it, so its quadratic check of unique keys never runs (no timing here: the suite never fails for being slow).
    const keys = Array.from({ length: 30_000 }, (_, i) => `  k${i}: 1`).join('\n');
    const out = problems(base.replace('case:\n  id: T-1', `case:\n  id: T-1\n${keys}`));
    expect(out).toMatch(/^case\.yaml: the case file holds \d+ colons, more than the 20000 keys a case file may have/);
    const some = Array.from({ length: 1500 }, (_, i) => `  k${i}: 1`).join('\n');
    expect(problems(base.replace('case:\n  id: T-1', `case:\n  id: T-1\n${some}`))).toMatch(/^case\.yaml:3:3: a mapping with 1501 keys, more than the 1000 one mapping may have/);
  });

  it('a key given twice is refused at the second one', () => {
    const text = base.replace('  id: T-1', '  id: T-1\n  title: a\n  id: T-2');
    expect(problems(text)).toMatch(new RegExp(`^case\\.yaml:${lineOf(text, 'id: T-2')}:3: not valid YAML: the key "id" is given twice in one mapping`));
  });

  it('more than 200 segments, 200 stations or 100 parts on a station are refused', () => {
    const segs = Array.from({ length: 201 }, () => '    - { length: 4 mm, diameter: 50 mm }').join('\n');
    const text = base.replace('    - length: 800 mm\n      diameter: 50 mm', segs);
    expect(problems(text)).toMatch(new RegExp(`^case\\.yaml:${lineOf(text, '- { length')}:\\d+ shaft\\.segments: has 201 segments, more than the 200 a case may have; give at most 200`, 'm'));
    const stations = Array.from({ length: 201 }, (_, i) => `  - { name: s${i}, at: 1 mm }`).join('\n');
    expect(problems(base.replace('stations:\n', `stations:\n${stations}\n`))).toMatch(/stations: has 203 stations, more than the 200/);
    const parts = Array.from({ length: 101 }, () => '      - { shape: inertia, inertia: 1 kg*m^2 }').join('\n');
    expect(problems(base.replace('    parts:\n', `    parts:\n${parts}\n`))).toMatch(/stations\[1\]\.parts: has 102 parts, more than the 100/);
  });

  it('a stop ramp or a window over 10 s is refused', () => {
    expect(problems(base.replace('  at: jam', '  at: jam\n  duration: 60 s'))).toMatch(/stop\.duration: "60 s" is out of range \(1 us to 10 s\)/);
    expect(problems(`${base}analysis: { duration: 11 s }\n`)).toMatch(/analysis\.duration: "11 s" is out of range \(0\.01 ms to 10 s\)/);
  });
});
