import { describe, expect, it } from 'vitest';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { ep5Case } from '../data/ep5-case.ts';

const fracture = (type: string) => ['fracture:', `  type: ${type}`, '  at: seized bearing'];
const breaking = ['shear_modulus: 79.3 GPa', 'yield_strength: 530 MPa', 'fracture_strain: 0.05'];

describe('reading a recorded fracture (Results.observedFindings.fracture)', () => {
  // Meanings of the surfaces: ASM Handbook Vol. 11 (2002) "Failures of Shafts"; Beer & Johnston Ch. 3
  // (shared REFERENCE.md 13.1–13.3; from memory, verify sections).
  it('a transverse fracture where ductile fracture is predicted agrees, and means a ductile shear overload', () => {
    const f = analyseCase(ep5Case({ speed: '1500 rpm', material: breaking, observed: fracture('transverse') })).observedFindings.fracture!;
    expect(f.agreement).toBe('agrees');
    expect(f.meaning).toMatch(/ductile shear overload/);
    expect(f.source).toMatch(/ASM Handbook Vol\. 11.*Failures of Shafts/);
    expect(f.caution).toMatch(/qualified/);
    expect(f.predictedAt?.side).toBe('B'); // the disc lies beyond the stop, toward the shaft's end
  });

  it('a transverse fracture where none is predicted disagrees and points at more energy or a crack', () => {
    const f = analyseCase(ep5Case({ observed: fracture('transverse') })).observedFindings.fracture!;
    expect(f.agreement).toBe('disagrees');
    expect(f.comparison).toMatch(/more energy/);
  });

  it('a 45° helix on a ductile shaft disagrees and suggests embrittlement or tension', () => {
    const f = analyseCase(ep5Case({ speed: '1500 rpm', material: breaking, observed: fracture('helical') })).observedFindings.fracture!;
    expect(f.meaning).toMatch(/45° helix/);
    expect(f.agreement).toBe('disagrees');
    expect(f.comparison).toMatch(/embrittlement/);
  });

  it('a 45° helix on a brittle shaft that is predicted to break agrees', () => {
    const iron = ['shear_modulus: 41.4 GPa', 'yield_strength: 207 MPa', 'tensile_strength: 207 MPa', 'elongation: 0.5 %'];
    const f = analyseCase(ep5Case({ material: iron, observed: fracture('helical') })).observedFindings.fracture!;
    expect(f.agreement).toBe('agrees');
  });

  it('beach marks (fatigue) cannot test the overload verdict: the jam may only have finished a crack', () => {
    const f = analyseCase(ep5Case({ observed: fracture('fatigue') })).observedFindings.fracture!;
    expect(f.agreement).toBe('not_comparable');
    expect(f.meaning).toMatch(/beach marks/i);
    expect(f.meaning).toMatch(/only have finished a crack/);
  });

  it('no fracture where fracture is predicted disagrees; none where none is predicted agrees', () => {
    expect(analyseCase(ep5Case({ speed: '1500 rpm', material: breaking, observed: fracture('none') })).observedFindings.fracture!.agreement).toBe('disagrees');
    expect(analyseCase(ep5Case({ observed: fracture('none') })).observedFindings.fracture!.agreement).toBe('agrees');
  });

  it('is absent when the case records no fracture', () => {
    expect(analyseCase(ep5Case()).observedFindings.fracture).toBeUndefined();
  });
});
