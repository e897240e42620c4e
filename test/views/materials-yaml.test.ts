import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { MATERIAL_LIBRARY } from '../../src/materials/library.ts';
import { MATERIAL_FIELDS } from '../../src/materials/material.ts';
import { materialsToYaml } from '../../src/views/materials-yaml.ts';

describe('materialsToYaml (materials --yaml)', () => {
  it("reads back through the case reader as the library's materials, every value within six significant figures", () => {
    const text = materialsToYaml(MATERIAL_LIBRARY);
    const indented = text.replace(/^#.*\n/gm, '');
    const base = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');
    let checked = 0;
    for (const m of MATERIAL_LIBRARY) {
      // Each library key used by the shaft, defined by the printed block: the case's own definition shadows the library's.
      const c = parseCase(base.replace('shaft:\n', `${indented}shaft:\n`).replace('material: aisi-1045-cd', `material: ${m.key}`), 'case.yaml');
      const read = c.materials[m.key];
      if (!read) continue; // a material the shaft cannot use (no yield strength) is not kept in the checked case
      for (const prop of Object.values(MATERIAL_FIELDS)) {
        const want = m[prop] as number | undefined;
        if (want === undefined) expect(read[prop], `${m.key}.${prop}`).toBeUndefined();
        else expect(Math.abs((read[prop] as number) / want - 1), `${m.key}.${prop}`).toBeLessThan(1e-5);
      }
      expect(read.source).toBe(m.source);
      checked++;
    }
    expect(checked).toBeGreaterThan(MATERIAL_LIBRARY.length / 2);
    expect(Object.keys(parse(text).materials)).toEqual(MATERIAL_LIBRARY.map((m) => m.key));
  });
});
