import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from '../helpers/case-problems.ts';
import { caseText } from '../helpers/layout.ts';

const withKey = (key: string) =>
  caseText({
    rpm: 300,
    segments: [[500, 40, 0]],
    stations: [
      ['hub', 0, 1, `    key: ${key}`],
      ['jam', 500, 0],
    ],
    stop: 'jam',
  });

describe("a station's key: width, height, length, material, hub_depth", () => {
  it('reads the key in SI and takes its material into the case', () => {
    const c = parseCase(withKey('{ width: 12 mm, height: 8 mm, length: 50 mm, material: aisi-1045-cd, hub_depth: 3 mm }'));
    expect(c.stations[0].key).toEqual({ width: 0.012, height: 0.008, length: 0.05, material: 'aisi-1045-cd', hubDepth: 0.003 });
    expect(c.materials['aisi-1045-cd'].yieldStrength).toBe(530e6);
  });

  it('inch fractions are read as the trade writes them', () => {
    const c = parseCase(withKey('{ width: 3/8 in, height: 3/8 in, length: 1 3/8 in, material: aisi-1020-cd }'));
    expect(c.stations[0].key!.length).toBeCloseTo(1.375 * 0.0254, 15);
  });

  it('a missing width is reported with its path and an example', () => {
    const text = withKey('{ height: 8 mm, length: 50 mm, material: aisi-1045-cd }');
    expect(problems(text)).toMatch(new RegExp(`case\\.yaml:${lineOf(text, 'key:')}:\\d+ stations\\[0\\]\\.key\\.width: is required; give the key's width such as "16 mm"`));
  });

  it("a hub depth not smaller than the key's height is refused", () => {
    const text = withKey('{ width: 12 mm, height: 8 mm, length: 50 mm, material: aisi-1045-cd, hub_depth: 8 mm }');
    expect(problems(text)).toMatch(new RegExp(`:${lineOf(text, 'hub_depth')}:\\d+ stations\\[0\\]\\.key\\.hub_depth: the part of the key in the hub must be less than the key's height`));
  });

  it('an unknown key material gets a did-you-mean', () => {
    expect(problems(withKey('{ width: 12 mm, height: 8 mm, length: 50 mm, material: aisi-1045-dc }'))).toMatch(
      /stations\[0\]\.key\.material: unknown material "aisi-1045-dc"; did you mean "aisi-1045-cd"\?/,
    );
  });

  it('a key that is not a mapping says what belongs there', () => {
    expect(problems(withKey('16 mm'))).toMatch(/stations\[0\]\.key: should be a mapping of width, height, length, material/);
  });
});
