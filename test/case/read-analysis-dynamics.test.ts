import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { DEFAULT_DAMPING_RATIO } from '../../src/case/case.ts';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from './problems.ts';

const base = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');

describe('the analysis section', () => {
  it('defaults: shaft inertia on, the default damping, elements and duration left to the model', () => {
    expect(parseCase(base).analysis).toMatchObject({ criterion: 'distortion-energy', shaftInertia: true, dampingRatio: DEFAULT_DAMPING_RATIO });
  });

  it('reads elements, shaft_inertia, damping_ratio (plain or in percent) and duration', () => {
    const a = parseCase(base + 'analysis:\n  elements: 40\n  shaft_inertia: false\n  damping_ratio: 2 %\n  duration: 300 ms\n').analysis;
    expect(a).toMatchObject({ criterion: 'distortion-energy', elements: 40, shaftInertia: false, dampingRatio: 0.02, duration: 0.3 });
    expect(parseCase(base + 'analysis: { damping_ratio: 0.03 }\n').analysis.dampingRatio).toBe(0.03);
  });

  it('refuses a fractional or huge element count, a damping ratio of 1 or more, and a duration without a unit', () => {
    const frac = base + 'analysis:\n  elements: 2.5\n';
    expect(problems(frac).join('\n')).toMatch(new RegExp(`:${lineOf(frac, 'elements: 2.5')}:\\d+ analysis\\.elements: 2\\.5 is not a whole number`));
    expect(problems(base + 'analysis: { elements: 50000 }\n').join('\n')).toMatch(/analysis\.elements: 50000 is more than 2000/);
    expect(problems(base + 'analysis: { damping_ratio: 1.5 }\n').join('\n')).toMatch(/analysis\.damping_ratio: 1\.5 is not below 1 \(critical damping\)/);
    const dur = base + 'analysis:\n  duration: 3\n';
    expect(problems(dur).join('\n')).toMatch(new RegExp(`:${lineOf(dur, 'duration: 3')}:\\d+ analysis\\.duration: "3" has no unit`));
    expect(problems(base + 'analysis: { shaft_inertia: maybe }\n').join('\n')).toMatch(/analysis\.shaft_inertia: should be true or false/);
  });

  it('reads dynamic_plasticity, on unless the case turns it off, and refuses a value that is not true or false, with its line', () => {
    expect(parseCase(base).analysis.dynamicPlasticity).toBe(true);
    expect(parseCase(base + 'analysis:\n  dynamic_plasticity: false\n').analysis.dynamicPlasticity).toBe(false);
    const bad = base + 'analysis:\n  dynamic_plasticity: sometimes\n';
    expect(problems(bad).join('\n')).toMatch(new RegExp(`:${lineOf(bad, 'dynamic_plasticity: sometimes')}:\\d+ analysis\\.dynamic_plasticity: should be true or false`));
  });
});
