import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { resizeCase } from '../../src/resize/resize-case.ts';
import { sideYieldRatio } from '../../src/resize/side-ratio.ts';
import { rel } from '../helpers/layout.ts';
import { withFinding } from '../../src/finding/investigation.ts';

const dir = new URL('../../sample-cases/', import.meta.url);
const samples = readdirSync(dir).filter((f) => f.endsWith('.yaml'));
const load = (f: string) => {
  const c = parseCase(readFileSync(new URL(f, dir), 'utf8'), f);
  return { c, r: withFinding(analyseCase(c)) };
};
const made = new Map<string, ReturnType<typeof load> & { z: ReturnType<typeof resizeCase>; before: string; ratio: number }>();
/** Each sample case analysed and resized at its own factor once for the file, with the case and ratio as they were before. */
const resized = (f: string) => {
  let m = made.get(f);
  if (!m) {
    const { c, r } = load(f);
    const before = JSON.stringify(c);
    const ratio = r.yieldRatio;
    m = { c, r, before, ratio, z: resizeCase(c, r) };
    made.set(f, m);
  }
  return m;
};

describe('resizeCase on every sample case', () => {
  it.each(samples)("%s: every option is there, and the scaled side's rerun confirms 1/N", (f) => {
    const { r, z } = resized(f);
    expect(z.designFactor).toBe(1.5);
    // The law s = yield_ratio·N holds for shaft alone; a flexible coupling's s comes by bisection.
    const coupled = z.scaleSide.segments.some((g) => g.coupling?.stiffness !== undefined);
    if (!coupled) expect(z.scaleSide.s).toBe(r.yieldRatio * 1.5);
    else expect(z.scaleSide.s).toBeLessThan(r.yieldRatio * 1.5);
    expect(rel(sideYieldRatio(z.scaleSide.rerun, z.scaleSide.side), 1 / 1.5)).toBeLessThan(1e-12);
    expect(z.materials.length).toBeGreaterThan(5);
    expect(z.limiter.max).toBeGreaterThan(0);
    // Guards, the cause of the jam, the restart and the codes always; lockout/tagout in the cautions always.
    expect(z.guarding.map((g) => g.topic)).toEqual(expect.arrayContaining(['Guards', 'Cause of the jam', 'Restart', 'Codes']));
    expect(z.cautions.join(' ')).toMatch(/lock out and tag out every energy source/);
    expect(z.cautions).toBe(r.cautions);
  });

  it('the granulator and the screw conveyor carry a drive and a key; the edger has neither', () => {
    expect(resized('granulator-tramp-metal.yaml').z.keys.map((k) => k.station)).toEqual(['drive sheave']);
    expect(resized('screw-conveyor-jam-us.yaml').z.limiter.min).toBeDefined();
    const edger = resized('edger-arbor-two-sides.yaml').z;
    expect(edger.keys).toEqual([]);
    expect(edger.limiter.min).toBeUndefined();
  });

  it("--factor overrides the case's design factor; a factor below 1 is a bug to call with", () => {
    const { c, r } = resized('screw-conveyor-jam-us.yaml');
    const z = resizeCase(c, r, { factor: 2 });
    expect(z.designFactor).toBe(2);
    expect(z.scaleSide.s).toBe(r.yieldRatio * 2);
    expect(() => resizeCase(c, r, { factor: 0.5 })).toThrow(/design factor of 1 or more/);
  });

  it('does not change the case or the results it is given', () => {
    const { c, r, before, ratio } = resized('granulator-tramp-metal.yaml');
    expect(JSON.stringify(c)).toBe(before);
    expect(r.yieldRatio).toBe(ratio);
  });
});
