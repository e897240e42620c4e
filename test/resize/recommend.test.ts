import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { resizeCase } from '../../src/resize/resize-case.ts';
import { PICK_RULE, recommendOption } from '../../src/resize/recommend.ts';
import { withFinding } from '../../src/finding/investigation.ts';
import type { ResizeResult } from '../../src/resize/resize-result.ts';

const made = new Map<string, ResizeResult>();
const resized = (f: string) => {
  let z = made.get(f);
  if (!z) {
    const c = parseCase(readFileSync(new URL(`../../sample-cases/${f}`, import.meta.url), 'utf8'));
    z = resizeCase(c, withFinding(analyseCase(c)));
    made.set(f, z);
  }
  return z;
};

/** The result with every material, and the named options, given a flag: to walk down the rule's order. */
const flagged = (z: ResizeResult, options: ('critical' | 'scale' | 'limiter')[]): ResizeResult => ({
  ...z,
  materials: z.materials.map((m) => ({ ...m, flags: ['test flag'] })),
  criticalSegment: { ...z.criticalSegment, flags: options.includes('critical') ? ['test flag'] : [] },
  scaleSide: { ...z.scaleSide, flags: options.includes('scale') ? ['test flag'] : [] },
  limiter: { ...z.limiter, flags: options.includes('limiter') ? ['test flag'] : [] },
});

describe('the pick of what goes back in, by the stated rule', () => {
  it('states its rule in the result', () => {
    expect(resized('screw-conveyor-jam-us.yaml').pickRule).toBe(PICK_RULE);
    expect(PICK_RULE).toMatch(/least change .* design factor N both in a repeat of the incident and under the running torque/);
  });

  it('the screw conveyor: a stronger steel on the same drawing, the least change that keeps N in a repeat and in running', () => {
    const z = resized('screw-conveyor-jam-us.yaml');
    expect(z.recommended?.option).toBe('material:aisi-4340-qt540');
    const m = z.materials.find((x) => x.material.key === 'aisi-4340-qt540')!;
    expect(m.flags).toEqual([]);
    expect(m.yieldRatio * 1.5).toBeLessThanOrEqual(1);
    expect(m.running.keeps).toBe(true);
    expect(z.recommended?.reason).toMatch(/same family as the present shaft, keeps N = 1.5 .*stress \/ shear yield 0.42 against 0.667.*under the running torque it keeps 7.77/);
  });

  it('walks down the order of change: material, the critical segment alone, the side scaled, a limiter', () => {
    const z = resized('screw-conveyor-jam-us.yaml');
    expect(recommendOption(flagged(z, []))?.option).toBe('critical_segment');
    expect(recommendOption(flagged(z, ['critical']))?.option).toBe('scale_side');
    expect(recommendOption(flagged(z, ['critical', 'scale']))?.option).toBe('limiter');
    expect(recommendOption(flagged(z, ['critical', 'scale', 'limiter']))).toBeUndefined();
  });

  it('a material of another family is never the pick, flag or no flag', () => {
    const z = resized('screw-conveyor-jam-us.yaml');
    const onlyAluminium = { ...flagged(z, ['critical', 'scale', 'limiter']), materials: z.materials.filter((m) => m.material.key === 'al-7075-t6').map((m) => ({ ...m, flags: [] })) };
    expect(recommendOption(onlyAluminium)).toBeUndefined();
  });

  it('the exhaust fan: the side would grow ×30.8, beyond max_scale, so the torque limiter comes first', () => {
    const z = resized('exhaust-fan-seized-impeller.yaml');
    expect(z.scaleSide.practical).toBe(false);
    expect(z.recommended?.option).toBe('limiter');
    expect(z.recommended?.reason).toMatch(/torque limiter at "fan sheave" .* beyond analysis.max_scale 1.3/);
    // With the limiter first, an unflagged material would still come after it.
    const withGoodMaterial = { ...z, materials: z.materials.map((m, i) => ({ ...m, flags: i === 0 ? [] : m.flags })) };
    expect(recommendOption(withGoodMaterial)?.option).toBe('limiter');
  });

  it('the granulator: every option alone has a flag, so the rule goes on to the combinations and picks the limiter at the middle of its window', () => {
    const z = resized('granulator-tramp-metal.yaml');
    expect(z.limiter.flags[0]).toMatch(/fails its own design factor: .* 0.717, above the 0.667 .* stress wave in "rotor body", which no limiter cuts/);
    expect(recommendOption({ ...z, combined: [] })).toBeUndefined();
    expect(z.recommended?.option).toBe('limiter_setting');
    const o = z.combined.find((x) => x.option === 'limiter_setting')!;
    expect(o.flags).toEqual([]);
    // √(1500 N·m × 3030 N·m): the window's middle on a log scale; its repeat keeps N.
    expect(o.limiters[0].setting).toBeCloseTo(Math.sqrt(z.limiter.min! * z.limiter.max), 6);
    expect(o.yieldRatio * 1.5).toBeLessThanOrEqual(1);
    expect(z.recommended?.reason).toMatch(
      /with a like-for-like shaft the limiter holds a repeat of the incident to a stress \/ shear yield of 0.482 against 0.667, where the limiter alone at the top of its window does not \(it fails its own design factor\)/,
    );
  });

  it('the combinations come after every option alone, in their own order', () => {
    const z = resized('granulator-tramp-metal.yaml');
    const o = z.combined[0];
    const as = (option: 'limiter_setting' | 'limiter_material' | 'limiter_segments', flags: string[]) => ({ ...o, option, flags, material: z.materials[0].material });
    const walk = (combined: ReturnType<typeof as>[]) => recommendOption({ ...z, combined })?.option;
    expect(walk([as('limiter_setting', ['test flag']), as('limiter_material', []), as('limiter_segments', [])])).toBe('limiter_material');
    expect(walk([as('limiter_setting', ['test flag']), as('limiter_material', ['test flag']), as('limiter_segments', [])])).toBe('limiter_segments');
    // An option alone that passes comes before any combination.
    const goodMaterial = { ...flagged(z, ['critical', 'scale', 'limiter']), materials: z.materials.map((m) => ({ ...m, flags: m.material.key === 'aisi-4340-qt540' ? [] : ['test flag'] })) };
    expect(recommendOption({ ...goodMaterial, combined: [as('limiter_setting', [])] })?.option).toBe('material:aisi-4340-qt540');
  });

  it('where the present shaft already keeps N, a replacement like for like', () => {
    const z = resized('screw-conveyor-jam-us.yaml');
    const keeps = { ...z, scaleSide: { ...z.scaleSide, needed: false, presentYieldRatio: 0.5 } };
    expect(recommendOption(keeps)).toMatchObject({ option: 'present', reason: expect.stringMatching(/present sizes and material already keep N = 1.5 .* 0.5 against 0.667/) });
  });
});
