import { describe, expect, it } from 'vitest';
import { findMaterial } from '../../src/materials/library.ts';
import { withDiameters, withShaftMaterial } from '../../src/resize/change-case.ts';
import { caseOf } from '../helpers/layout.ts';

const c = caseOf({
  rpm: 300,
  segments: [
    [200, 60, 30],
    [300, 50, 0],
  ],
  stations: [
    ['jam', 0, 0],
    ['disc', 500, 2],
  ],
  stop: 'jam',
});

describe('changed copies of a case', () => {
  it('withDiameters keeps each bore ratio and leaves the other segments and the input alone', () => {
    const before = JSON.stringify(c);
    const d = withDiameters(c, new Map([[0, 0.09]]));
    expect(d.shaft.segments[0].diameter).toBe(0.09);
    expect(d.shaft.segments[0].bore / d.shaft.segments[0].diameter).toBeCloseTo(0.5, 15);
    expect(d.shaft.segments[1]).toBe(c.shaft.segments[1]);
    expect(JSON.stringify(c)).toBe(before);
  });

  it("withShaftMaterial puts the material in every segment and in the case's materials", () => {
    const m = findMaterial('al-7075-t6')!;
    const d = withShaftMaterial(c, m);
    expect(d.shaft.segments.every((s) => s.material === 'al-7075-t6')).toBe(true);
    expect(d.materials['al-7075-t6']).toBe(m);
    expect(c.shaft.segments[0].material).toBe('aisi-1045-cd');
  });
});
