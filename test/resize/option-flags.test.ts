import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { resizeCase } from '../../src/resize/resize-case.ts';
import { withFlags } from '../../src/resize/option-flags.ts';
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

describe('the flags: why an option is not advisable, with its numbers', () => {
  it('an option past its own design factor, at three figures or as many as tell the two apart', () => {
    const z = resized('screw-conveyor-jam-us.yaml');
    // The limiter's rerun peaks at a stress / shear yield of 0.668 (independently: its yield ratio over 1/N).
    expect(z.limiter.yieldRatio * 1.5).toBeGreaterThan(1);
    expect(z.limiter.flags).toEqual(['fails its own design factor: a repeat of the incident takes it to a stress / shear yield of 0.668, above the 0.667 that N = 1.5 allows']);
    const gr = resized('granulator-tramp-metal.yaml');
    expect(gr.scaleSide.flags.join(' ')).toMatch(/0\.6668, above the 0\.6667/);
  });

  it('every option that fails its factor is flagged, and none that keeps it is flagged for that', () => {
    for (const f of ['screw-conveyor-jam-us.yaml', 'exhaust-fan-seized-impeller.yaml']) {
      const z = resized(f);
      for (const m of z.materials) expect(m.flags.some((x) => x.startsWith('fails its own design factor'))).toBe(m.yieldRatio * z.designFactor > 1 + 1e-9);
    }
  });

  it('an option that fails in normal running', () => {
    const ss = resized('screw-conveyor-jam-us.yaml').materials.find((m) => m.material.key === 'ss-304-annealed')!;
    expect(ss.running.keeps).toBe(false);
    expect(ss.flags).toContain(`fails in normal running: under the running torque it keeps a factor of ${Number(ss.running.factorWithKt!.toPrecision(3))} on shear yield with kt, below N = 1.5`);
  });

  it('a scale beyond max_scale', () => {
    const z = resized('exhaust-fan-seized-impeller.yaml');
    expect(z.scaleSide.flags[0]).toMatch(/^impractical: every diameter of side A would grow ×30.8, beyond analysis.max_scale 1.3/);
    expect(resized('screw-conveyor-jam-us.yaml').scaleSide.flags).toEqual([]);
  });

  it('a material of another family than the present shaft, and none for one of the same', () => {
    const z = resized('screw-conveyor-jam-us.yaml');
    const flagOf = (key: string) => z.materials.find((m) => m.material.key === key)!.flags;
    expect(flagOf('al-7075-t6')).toEqual([expect.stringMatching(/^another family of material \(aluminium alloy\) than the present shaft \(carbon and alloy steel\)/)]);
    expect(flagOf('ss-17-4ph-h1150').join(' ')).toMatch(/\(stainless steel\)/);
    expect(flagOf('aisi-4140-qt540')).toEqual([]);
  });

  it('a critical segment that cannot work alone, and one that is not needed', () => {
    expect(resized('exhaust-fan-seized-impeller.yaml').criticalSegment.flags[0]).toMatch(/^no size of this segment alone works: where it reaches 0.667 .* reaches 17/);
    const z = resized('screw-conveyor-jam-us.yaml');
    const again = withFlags({ ...z, criticalSegment: { ...z.criticalSegment, verdict: 'present-keeps', presentYieldRatio: 0.5 } });
    expect(again.criticalSegment.flags[0]).toBe('not needed: the segment already keeps the factor (stress / shear yield 0.5)');
  });

  it('a limiter with an empty window, parts between it and the stop, or another side it does not protect', () => {
    const z = resized('screw-conveyor-jam-us.yaml');
    const l = withFlags({ ...z, limiter: { ...z.limiter, windowEmpty: true, unlimitedStations: ['hub'], otherSides: [{ side: 'B', yieldRatio: 0.9 }] } }).limiter.flags;
    expect(l).toContain('its window is empty: the lowest setting that runs the machine is above the highest that protects the shaft');
    expect(l).toContain('the parts at "hub" lie between it and the stop and still drive the shaft unlimited');
    expect(l).toContain('does not protect side B of the stop (stress / shear yield 0.9): that side needs its own');
  });

  it('a key as fuse always, and more where it does not shear before the shaft yields', () => {
    const [k] = resized('screw-conveyor-jam-us.yaml').keys;
    expect(k.shearsBeforeShaftYields).toBe(false);
    expect(k.flags[0]).toBe(`does not shear before the shaft yields: it shears off at ${Number((k.shearOffTorque / k.shaftYieldTorque).toPrecision(3))} × the torque at which the shaft yields`);
    expect(k.flags[1]).toMatch(/no dependable fuse/);
  });
});
