import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from '../helpers/case-problems.ts';

const base = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8').replace('material: aisi-1045-cd', 'material: mill-1045');
const SIX = `    cyclic_strength_coefficient: 1344 MPa
    cyclic_hardening_exponent: 0.18
    fatigue_strength_coefficient: 1227 MPa
    fatigue_strength_exponent: -0.095
    fatigue_ductility_coefficient: 1.0
    fatigue_ductility_exponent: -0.66
`;
const withMaterial = (extra: string) =>
  base.replace(
    'shaft:\n',
    `materials:\n  mill-1045:\n    shear_modulus: 79.3 GPa\n    elastic_modulus: 202 GPa\n    density: 7850 kg/m^3\n    yield_strength: 530 MPa\n    tensile_strength: 630 MPa\n${extra}shaft:\n`,
  );

describe("a case material's cyclic constants", () => {
  it('all six are read, SI, and the fatigue of the jam uses them', () => {
    const c = parseCase(withMaterial(SIX), 'case.yaml');
    expect(c.materials['mill-1045'].cyclic).toEqual({
      cyclicStrengthCoefficient: 1344e6,
      cyclicHardeningExponent: 0.18,
      fatigueStrengthCoefficient: 1227e6,
      fatigueStrengthExponent: -0.095,
      fatigueDuctilityCoefficient: 1.0,
      fatigueDuctilityExponent: -0.66,
    });
  });

  it('none is fine: the material has no cyclic constants', () => {
    expect(parseCase(withMaterial(''), 'case.yaml').materials['mill-1045'].cyclic).toBeUndefined();
  });

  it('some but not all is refused at the first one given, naming the missing ones', () => {
    const text = withMaterial(SIX.split('\n').slice(0, 2).join('\n') + '\n');
    expect(problems(text)).toMatch(
      new RegExp(
        `case.yaml:${lineOf(text, 'cyclic_strength_coefficient')}:\\d+ materials\\.mill-1045\\.cyclic_strength_coefficient: gives 2 of the six cyclic constants; give all six \\(fatigue_strength_coefficient: "1227 MPa"`,
      ),
    );
  });

  it('an exponent of the wrong sign is refused with its line and a right value', () => {
    const text = withMaterial(SIX.replace('-0.095', '0.095'));
    expect(problems(text)).toMatch(
      new RegExp(
        `case.yaml:${lineOf(text, 'fatigue_strength_exponent')}:\\d+ materials\\.mill-1045\\.fatigue_strength_exponent: 0\\.095 is out of range; give a negative plain number such as -0\\.095 \\(-0\\.3 to -0\\.01\\)`,
      ),
    );
  });

  it('a coefficient without its unit is refused as a stress', () => {
    const text = withMaterial(SIX.replace('1344 MPa', '1344'));
    expect(problems(text)).toMatch(/materials\.mill-1045\.cyclic_strength_coefficient: /);
  });

  it('case.asset is read, and an empty one is refused with its line', () => {
    const tagged = withMaterial('').replace('  id: T-1\n', '  id: T-1\n  asset: GR-4 rotor shaft\n');
    expect(parseCase(tagged, 'case.yaml').meta.asset).toBe('GR-4 rotor shaft');
    const empty = withMaterial('').replace('  id: T-1\n', '  id: T-1\n  asset: " "\n');
    expect(problems(empty)).toMatch(new RegExp(`case.yaml:${lineOf(empty, 'asset')}:\\d+ case\\.asset: is empty`));
  });
});
