import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { problems } from '../helpers/case-problems.ts';

const proto = readFileSync(new URL('../data/proto-materials.yaml', import.meta.url), 'utf8');

describe('readCaseMaterials: names of the object prototype are names like any other', () => {
  it('a material named __proto__ and one named constructor are read and used, and the case runs', () => {
    const c = parseCase(proto, 'case.yaml');
    expect(Object.hasOwn(c.materials, '__proto__')).toBe(true);
    expect(c.materials['__proto__'].shearModulus).toBe(79e9);
    expect(c.materials['constructor'].density).toBe(7200);
    const r = analyseCase(c);
    expect(Number.isFinite(r.maxShearStress)).toBe(true);
  });

  it('a name that only the object prototype knows is an unknown material', () => {
    expect(problems(proto.replace('material: constructor', 'material: toString'))).toMatch(/parts\[0\]\.material: unknown material "toString"/);
    expect(problems(proto.replace('material: __proto__', 'material: hasOwnProperty'))).toMatch(/shaft\.material: unknown material "hasOwnProperty"/);
  });
});
