import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { torqueTwistFigure } from '../../src/report/figures/torque-twist-curve.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { dynamicPastYieldLines } from '../../src/views/dynamic-past-yield.ts';

const granulator = parseCase(readFileSync(new URL('../../sample-cases/granulator-tramp-metal.yaml', import.meta.url), 'utf8'));

describe('the dynamic model past yield, in words', () => {
  it('names the law the shaft elements carry: linear strain hardening where the case asks for it, elastic–perfectly plastic otherwise', () => {
    const plain = analyseCase(granulator, { readBack: false });
    const hard = analyseCase({ ...granulator, analysis: { ...granulator.analysis, hardening: 'linear' } }, { readBack: false });
    expect(hard.pastYieldBasis).toBe('dynamic model');
    expect(dynamicPastYieldLines(plain)[1]).toMatch(/elastic–perfectly plastic on the net section/);
    expect(dynamicPastYieldLines(hard)[1]).toMatch(/linear strain hardening on the net section/);
    expect(dynamicPastYieldLines(hard)[1]).not.toMatch(/perfectly plastic/);
    expect(torqueTwistFigure(hard)!.caption).not.toMatch(/perfectly plastic/i);
    expect(torqueTwistFigure(hard)!.caption).toMatch(/linear strain hardening/i);
  });

  it('says brittle pieces break at their fracture stress instead of yielding', () => {
    const text = `case: { id: B }
speed: 200 rad/s
stop: { at: jam, duration: 0.2 ms }
shaft:
  material: gray-iron-30
  segments:
    - { length: 500 mm, diameter: 40 mm }
stations:
  - { name: disc, at: 0 mm, parts: [{ shape: inertia, inertia: 0.98646 kg*m^2 }] }
  - { name: jam, at: 500 mm }
analysis: { shaft_inertia: false, damping_ratio: 0 }
`;
    const r = analyseCase(parseCase(text), { readBack: false });
    expect(r.pastYieldBasis).toBe('dynamic model');
    expect(dynamicPastYieldLines(r)[1]).toMatch(/brittle pieces elastic up to their fracture stress/);
    expect(dynamicPastYieldLines(r)[1]).not.toMatch(/perfectly plastic/);
  });
});
