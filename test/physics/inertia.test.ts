import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { discInertia, kineticEnergy, massInertia, reflectedInertia } from '../../src/physics/inertia.ts';

describe('inertia of parts', () => {
  it('discInertia of a solid disc equals ½·m·r² (Beer & Johnston, Vector Mechanics: Dynamics, table of mass moments; from memory, confident)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 3, noNaN: true }), fc.double({ min: 0.001, max: 1, noNaN: true }), fc.double({ min: 1000, max: 9000, noNaN: true }), (D, t, rho) => {
        const m = (rho * t * (Math.PI * D ** 2)) / 4;
        return Math.abs(discInertia(rho, t, D) / (0.5 * m * (D / 2) ** 2) - 1) < 1e-12;
      }),
    );
  });

  it('discInertia of a bored disc equals ½·m·(ro² + ri²) (same source)', () => {
    const m = 7850 * 0.05 * (Math.PI / 4) * (0.4 ** 2 - 0.1 ** 2);
    expect(discInertia(7850, 0.05, 0.4, 0.1)).toBeCloseTo(0.5 * m * (0.2 ** 2 + 0.05 ** 2), 12);
  });

  it('massInertia is m·k², and a part behind a 2:1 belt counts four times (Den Hartog, geared systems; from memory, confident)', () => {
    expect(massInertia(30, 0.2)).toBeCloseTo(1.2, 14);
    expect(reflectedInertia(1.5, 2)).toBe(6);
    expect(kineticEnergy(2, 10)).toBe(100);
  });
});
