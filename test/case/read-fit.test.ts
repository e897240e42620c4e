import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from '../helpers/case-problems.ts';
import { caseText } from '../helpers/layout.ts';

const withFit = (fit: string, materials?: string) =>
  caseText({
    rpm: 300,
    segments: [[500, 50, 0]],
    stations: [
      ['jam', 0, 0],
      ['hub', 500, 1, `    fit: ${fit}`],
    ],
    stop: 'jam',
    materials,
  });

describe("a station's fit: interference, hub_outer_diameter, length, friction, hub_material", () => {
  it("reads the fit in SI, with the hub material's E and Poisson's ratio from the library", () => {
    const c = parseCase(withFit('{ interference: 0.05 mm, hub_outer_diameter: 100 mm, length: 60 mm, friction: 0.12, hub_material: aisi-1045-hr }'));
    expect(c.stations[1].fit).toEqual({ interference: 0.05e-3, hubOuterDiameter: 0.1, length: 0.06, friction: 0.12, hubMaterial: 'aisi-1045-hr' });
    expect(c.materials['aisi-1045-hr'].poissonRatio).toBe(0.292);
  });

  it("a case's own material gives its Poisson's ratio with poisson_ratio", () => {
    const mat = 'materials:\n  hub-iron: { name: hub iron, elastic_modulus: 110 GPa, poisson_ratio: 0.26 }';
    const c = parseCase(withFit('{ interference: 0.05 mm, hub_outer_diameter: 100 mm, length: 60 mm, friction: 0.12, hub_material: hub-iron }', mat));
    expect(c.materials['hub-iron'].poissonRatio).toBe(0.26);
  });

  it("a hub material without Poisson's ratio is refused with its path and what to add", () => {
    const mat = 'materials:\n  hub-iron: { name: hub iron, elastic_modulus: 110 GPa }';
    const text = withFit('{ interference: 0.05 mm, hub_outer_diameter: 100 mm, length: 60 mm, friction: 0.12, hub_material: hub-iron }', mat);
    expect(problems(text)).toMatch(
      new RegExp(
        `case\\.yaml:${lineOf(text, 'fit:')}:\\d+ stations\\[1\\]\\.fit\\.hub_material: material "hub-iron" has no poisson_ratio, which this use needs; add it under materials\\.hub-iron, e\\.g\\. poisson_ratio: 0\\.29`,
      ),
    );
  });

  it("a Poisson's ratio of 0.5 or more is refused", () => {
    const mat = 'materials:\n  hub-iron: { name: hub iron, elastic_modulus: 110 GPa, poisson_ratio: 0.6 }';
    expect(problems(withFit('{ interference: 0.05 mm, hub_outer_diameter: 100 mm, length: 60 mm, friction: 0.12, hub_material: hub-iron }', mat))).toMatch(
      /materials\.hub-iron\.poisson_ratio: 0\.6 is out of range; give Poisson's ratio/,
    );
  });

  it('a missing friction and an interference without a unit are each reported with an example', () => {
    const text = withFit('{ interference: 0.05, hub_outer_diameter: 100 mm, length: 60 mm, hub_material: aisi-1045-hr }');
    const p = problems(text);
    expect(p).toMatch(/stations\[1\]\.fit\.friction: is required; give the coefficient of friction at the seat, such as 0\.12/);
    expect(p).toMatch(/stations\[1\]\.fit\.interference: /);
  });

  it('a hub no larger than the seat, and an interference of more than 1 % of the seat, are refused', () => {
    const text = withFit('{ interference: 0.8 mm, hub_outer_diameter: 50 mm, length: 60 mm, friction: 0.12, hub_material: aisi-1045-hr }');
    const p = problems(text);
    expect(p).toMatch(/stations\[1\]\.fit\.hub_outer_diameter: is not larger than the shaft's diameter at the seat \(50 mm\)/);
    expect(p).toMatch(/stations\[1\]\.fit\.interference: is more than 1 % of the seat's diameter \(50 mm\)/);
  });

  it('an unknown key in the fit gets a did-you-mean', () => {
    expect(problems(withFit('{ interferance: 0.05 mm, hub_outer_diameter: 100 mm, length: 60 mm, friction: 0.12, hub_material: aisi-1045-hr }'))).toMatch(
      /stations\[1\]\.fit\.interferance: unknown key; did you mean "interference"\?/,
    );
  });
});
