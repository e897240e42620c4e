import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { decideFinding } from '../../src/finding/finding.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { findingSentence } from '../../src/views/finding-words.ts';
import { ep5Case } from '../data/ep5-case.ts';

const sample = (f: string) => analyseCase(parseCase(readFileSync(new URL(`../../sample-cases/${f}`, import.meta.url), 'utf8')));

describe('decideFinding', () => {
  it('a shaft that stays elastic may return to service after the checks (EP5 at 100 rpm)', () => {
    const f = decideFinding(analyseCase(ep5Case({ speed: '100 rpm' })));
    expect(f.verdict).toBe('elastic');
    expect(f.action).toBe('return to service');
  });

  it('tells a stress raiser yielding locally from a section yielding through', () => {
    // EP5 (shared REFERENCE.md) at 150 rpm: the net section stays elastic (about 0.81 of yield without kt); kt 1.5 takes the stress past 1.
    const local = decideFinding(analyseCase(ep5Case({ speed: '150 rpm', segments: ['- { length: 500 mm, diameter: 40 mm, kt: 1.5 }'] })));
    expect(local.verdict).toBe('yielded locally');
    expect(local.yieldRatio).toBeGreaterThan(1.2);
    expect(local.yieldRatio).toBeLessThan(1.3);
    expect(local.permanentTwist).toBeUndefined();
    expect(local.action).toBe('inspect before return');
    expect(findingSentence(local, 'metric')).toMatch(/^YIELDED LOCALLY AT A STRESS RAISER \(energy method\): side B, segment 1 .*kt 1\.5.* while the net section stays elastic/);
  });

  it("gives the energy balance's permanent twist and capped torque for a section that yields through (EP5 at 300 rpm)", () => {
    const r = analyseCase(ep5Case());
    const f = decideFinding(r);
    expect(f.verdict).toBe('yielded');
    expect(f.basis).toBe('energy method');
    expect(f.pastYieldModel).toBe('energy balance');
    // REFERENCE EP5: permanent twist 0.041193 rad by the closed-form balance; the peak torque is capped below the elastic one.
    expect(Math.abs(f.permanentTwist! / 0.041193 - 1)).toBeLessThan(0.005);
    expect(f.peakTorque).toBe(r.plastic.sides[0].peakTorque);
    expect(f.peakTorque).toBeLessThan(f.elasticPeakTorque);
    expect(f.yieldRatio).toBe(r.yieldRatio);
    expect(f.breakTime).toBeUndefined();
    expect(f.disposition).toMatch(/^Not fit to return/);
    expect(f.action).toBe('replace');
  });

  it('names the first piece to break for a fracture by the energy balance', () => {
    // A stated fracture strain of 0.05 breaks EP5's shaft at 1500 rpm (as in test/results/analyse-plastic.test.ts).
    const r = analyseCase(ep5Case({ speed: '1500 rpm', material: ['shear_modulus: 79.3 GPa', 'yield_strength: 530 MPa', 'fracture_strain: 0.05'] }));
    const f = decideFinding(r);
    expect(f.verdict).toBe('fracture predicted');
    expect(f.permanentTwist).toBeUndefined();
    expect(f.piece.segment.index).toBe(0);
    expect(findingSentence(f, 'metric')).toMatch(/^FRACTURE PREDICTED \(energy method\): side B, segment 1 .* breaks, at its fracture strain/);
  });

  it('says a gray-iron shaft over its strength breaks rather than yields, by its shear strength', () => {
    const r = analyseCase(
      parseCase(`case: { id: B }
speed: 600 rpm
stop: { at: jam }
shaft:
  material: gray-iron-30
  segments:
    - { length: 500 mm, diameter: 40 mm }
stations:
  - { name: disc, at: 0 mm, parts: [{ shape: inertia, inertia: 1 kg*m^2 }] }
  - { name: jam, at: 500 mm }
`),
    );
    const f = decideFinding(r);
    expect(f.brittle).toBe(true);
    expect(f.action).toBe('replace');
    const text = findingSentence(f, 'metric');
    expect(text).not.toMatch(/YIELDED|shear yield/);
    expect(text).toMatch(/shear strength/);
  });

  it("stands on the dynamic model's numbers where the verdict does: its elastic ratio, its capped torque, its permanent twist", () => {
    const r = sample('granulator-tramp-metal.yaml');
    const f = decideFinding(r);
    expect(f.basis).toBe('dynamic model');
    expect(f.verdict).toBe('yielded');
    expect(f.yieldRatio).toBe(r.verdictYieldRatio);
    const piece = r.dynamic.pieces[r.dynamic.governing];
    expect(f.peakTorque).toBe(piece.peakTorque);
    expect(f.elasticPeakTorque).toBe(piece.elasticPeakTorque);
    expect(f.permanentTwist).toBeCloseTo(
      r.dynamic.pieces.reduce((s, p) => s + p.permanentTwist, 0),
      12,
    );
    // The energy method's 16-odd times yield is the comparison, not the finding.
    expect(f.yieldRatio).toBeLessThan(r.yieldRatio);
  });

  it("gives the break time of the dynamic model's fracture and no permanent twist for a side that broke", () => {
    const r = sample('mixer-motor-drove-through.yaml');
    const f = decideFinding(r);
    expect(f.verdict).toBe('fracture predicted');
    expect(f.breakTime).toBeGreaterThan(0);
    expect(f.permanentTwist).toBeUndefined();
    expect(f.piece.segment.label).toBe('coupling neck');
  });
});
