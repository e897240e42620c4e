import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { withDiameters } from '../../src/resize/change-case.ts';
import { stiffnessChange } from '../../src/resize/stiffness-change.ts';
import { caseOf, rel } from '../helpers/layout.ts';

describe('what an option does to the stiffness and natural frequency (energy-method estimate)', () => {
  it('scaling every diameter by s makes the shaft s⁴ as stiff (J_p ∝ d⁴), the frequency s² and the torque s² higher', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 3, noNaN: true }), (s) => {
        const c = caseOf({ rpm: 300, segments: [[200, 40, 0], [300, 50, 10]], stations: [['jam', 0, 0], ['disc', 500, 2]], stop: 'jam' });
        const present = analyseCase(c);
        const scaled = analyseCase(withDiameters(c, new Map([[0, 0.04 * s], [1, 0.05 * s]])));
        const k = stiffnessChange(present, scaled, 'B');
        // k = G·J_p/L, J_p = π(d⁴ − di⁴)/32 (REFERENCE 1.1.2, 1.1.5); ω_n = √(k/J) (REFERENCE 10.1).
        return rel(k.stiffness, s ** 4) < 1e-9 && rel(k.frequency, s ** 2) < 1e-9 && rel(k.peakTorque, s ** 2) < 1e-9;
      }),
    );
  });

  it('names its method', () => {
    const c = caseOf({ rpm: 300, segments: [[500, 50, 0]], stations: [['jam', 0, 0], ['disc', 500, 2]], stop: 'jam' });
    expect(stiffnessChange(analyseCase(c), analyseCase(c), 'B').method).toMatch(/energy method/);
  });
});
