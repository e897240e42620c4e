import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { motorLine, outsidePiece, pieceOf, reflectLine, torqueAt } from '../../src/physics/motor-torque.ts';

const curve = motorLine({
  kind: 'curve',
  points: [
    { speed: 0, torque: 580 },
    { speed: 100, torque: 520 },
    { speed: 150, torque: 290 },
    { speed: 157, torque: 0 },
  ],
});

describe('motor torque against speed', () => {
  it('is linear between the points and held beyond the ends', () => {
    expect(torqueAt(curve, 50)).toBeCloseTo(550, 12);
    expect(torqueAt(curve, 125)).toBeCloseTo(405, 12);
    expect(torqueAt(curve, -10)).toBe(580);
    expect(torqueAt(curve, 200)).toBe(0);
    expect(torqueAt(motorLine({ kind: 'constant', torque: 300 }), 77)).toBe(300);
  });

  it('passes through every point of the curve', () => {
    for (const [w, t] of [
      [0, 580],
      [100, 520],
      [150, 290],
      [157, 0],
    ])
      expect(torqueAt(curve, w)).toBeCloseTo(t, 12);
  });

  it('reflected through a speed ratio, it delivers the same power at the shaft', () => {
    // T_shaft·ω_shaft = T_motor·ω_motor with ω_motor = r·ω_shaft (Den Hartog, Mechanical Vibrations, geared systems; from memory, confident).
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 50, noNaN: true }), fc.double({ min: 0, max: 160, noNaN: true }), (r, wm) => {
        const shaft = reflectLine(curve, r);
        return Math.abs(torqueAt(shaft, wm / r) * (wm / r) - torqueAt(curve, wm) * wm) <= 1e-9 * (1 + torqueAt(curve, wm) * wm);
      }),
    );
  });

  it('tells which piece a speed is on and how far past its ends a speed lies', () => {
    expect(pieceOf(curve, -1)).toBe(0);
    expect(pieceOf(curve, 120)).toBe(2);
    expect(pieceOf(curve, 999)).toBe(4);
    expect(outsidePiece(curve, 2, 120)).toBeLessThan(0);
    expect(outsidePiece(curve, 2, 160)).toBeCloseTo(10, 12);
    expect(outsidePiece(curve, 2, 90)).toBeCloseTo(10, 12);
  });
});
