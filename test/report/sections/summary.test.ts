import { describe, expect, it } from 'vitest';
import { verdictInPlainWords } from '../../../src/report/sections/summary.ts';
import { analyseCase } from '../../../src/results/analyse-case.ts';
import { ep5Case } from '../../data/ep5-case.ts';

describe('verdictInPlainWords', () => {
  it('verdictInPlainWords says a stress raiser yields locally when only the elastic method with kt passes yield', () => {
    // EP5's shaft at 150 rpm: the net section stays elastic (yield ratio about 0.81 without kt), kt 1.5 takes it past 1.
    const r = analyseCase(ep5Case({ speed: '150 rpm', segments: ['- { length: 500 mm, diameter: 40 mm, kt: 1.5 }'] }));
    expect(r.elasticVerdict).toBe('yielded');
    expect(r.plastic.verdict).toBe('elastic');
    expect(r.verdict).toBe('yielded');
    expect(verdictInPlainWords(r)).toMatch(/^The net section of the shaft can have stayed elastic, but the calculated stress at the stress raiser \(kt\) of segment 1 .* is 1\.2\d? times its shear yield: expect local yielding there, with no measurable permanent twist\./);
  });

  it('verdictInPlainWords gives the permanent twist for a net section past yield, and the energy against the break for a fracture', () => {
    const yielded = analyseCase(ep5Case());
    expect(verdictInPlainWords(yielded)).toMatch(/^The shaft cannot have stayed elastic: .* permanent twist of [\d.]+° on side B, most of it in segment 1 .*; no fracture is predicted\./);
    // A stated fracture strain of 0.05 breaks EP5's shaft at 1500 rpm (as in test/results/analyse-plastic.test.ts).
    const broken = analyseCase(ep5Case({ speed: '1500 rpm', material: ['shear_modulus: 79.3 GPa', 'yield_strength: 530 MPa', 'fracture_strain: 0.05'] }));
    expect(broken.verdict).toBe('fracture predicted');
    expect(verdictInPlainWords(broken)).toMatch(/^The shaft is predicted to break: side B had [\d.]+ k?J of kinetic energy to take, and it can absorb only [\d.]+ k?J before segment 1 .* reaches its fracture strain\./);
  });
});
