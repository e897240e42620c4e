import { describe, expect, it } from 'vitest';
import type { Station } from '../../src/case/case.ts';
import { chainDrive } from '../../src/model/chain-drive.ts';
import { torqueAt } from '../../src/physics/motor-torque.ts';

const station = (drive: Station['drive']): Station => ({
  name: 'pulley',
  at: 0,
  parts: [
    { name: 'sheave', shape: 'inertia', inertia: 1, count: 1, speedRatio: 1, dimensions: {} },
    { name: 'rotor', shape: 'inertia', inertia: 0.2, count: 1, speedRatio: 4, dimensions: {} },
  ],
  drive,
});
const w = 30; // shaft speed, rad/s; motor at 120 rad/s

describe('chainDrive: a drive as the chain sees it', () => {
  it("reflects the motor through its ratio and takes the running torque from the curve at the motor's speed", () => {
    const d = chainDrive(
      station({
        speedRatio: 4,
        rotorParts: [1],
        torque: {
          kind: 'curve',
          points: [
            { speed: 0, torque: 100 },
            { speed: 150, torque: 0 },
          ],
        },
      }),
      0,
      w,
    );
    expect(d.rotorInertia).toBeCloseTo(0.2 * 16, 12);
    expect(d.runningTorque).toBeCloseTo(4 * (100 * (1 - 120 / 150)), 12);
    expect(torqueAt(d.line, 10)).toBeCloseTo(4 * (100 * (1 - 40 / 150)), 12);
    expect(d.assumptions).toEqual([]);
  });

  it("through a gearbox the motor's torque and the running torque reach the shaft at its efficiency, η·r·T (P_out = η·P_in); the rotor's inertia is reflected without loss", () => {
    const curve = {
      kind: 'curve' as const,
      points: [
        { speed: 0, torque: 100 },
        { speed: 150, torque: 0 },
      ],
    };
    const geared = { ...station({ speedRatio: 4, rotorParts: [1], torque: curve }), gearbox: { ratio: 4, ratedOutputTorque: 1000, serviceFactor: 1, efficiency: 0.8, backDrivable: true } };
    const d = chainDrive(geared, 0, w);
    // Power balance with efficiency: at shaft speed 10 rad/s the motor runs at 40 rad/s with T_m = 100·(1 − 40/150).
    expect(torqueAt(d.line, 10)).toBeCloseTo(0.8 * 4 * (100 * (1 - 40 / 150)), 12);
    expect(d.runningTorque).toBeCloseTo(0.8 * 4 * (100 * (1 - 120 / 150)), 12);
    expect(d.rotorInertia).toBeCloseTo(0.2 * 16, 12);
    expect(d.assumptions.join(' ')).toMatch(/through the gearbox at its efficiency 0\.8/);
  });

  it('without a torque, holds the running torque, or power ÷ speed, or nothing, and says so', () => {
    const held = chainDrive(station({ speedRatio: 4, rotorParts: [1], runningTorque: 50 }), 0, w);
    expect(torqueAt(held.line, 0)).toBeCloseTo(200, 12);
    expect(held.runningTorque).toBeCloseTo(200, 12);
    expect(held.assumptions.join(' ')).toMatch(/hold its running torque/);
    const rated = chainDrive(station({ speedRatio: 4, rotorParts: [1], power: 6000 }), 0, w);
    // T = P/ω at the motor (shared REFERENCE.md 1.1.9, H = T·ω): 6000/120 = 50 N·m, ×4 at the shaft.
    expect(torqueAt(rated.line, 0)).toBeCloseTo(200, 12);
    expect(rated.assumptions.join(' ')).toMatch(/power ÷ speed/);
    const tripped = chainDrive(station({ speedRatio: 4, rotorParts: [1] }), 0, w);
    expect(torqueAt(tripped.line, 0)).toBe(0);
    expect(tripped.runningTorque).toBe(0);
    expect(tripped.assumptions.join(' ')).toMatch(/no torque after the stop/);
  });

  it('given only by its power, holds P/ω and warns that this is unconservative (a pulled-down motor gives 2–3 × rated)', () => {
    // T = P/ω at the motor (shared REFERENCE.md 1.1.9); breakdown torque at least 200 % of rated
    // for NEMA MG 1 design B (from memory, verify), so P/ω understates a motor pulled down.
    const rated = chainDrive(station({ speedRatio: 4, rotorParts: [1], power: 6000 }), 0, w);
    expect(torqueAt(rated.line, 0)).toBeCloseTo((4 * 6000) / (4 * w), 12);
    expect(rated.warnings).toHaveLength(1);
    expect(rated.warnings[0]).toMatch(/given only by its power.*unconservative.*2 to 3 times its rated torque.*drive\.torque or drive\.curve/);
    for (const d of [{ runningTorque: 50 }, { power: 6000, torque: { kind: 'constant' as const, torque: 90 } }, { power: 6000, runningTorque: 50 }, {}]) {
      expect(chainDrive(station({ speedRatio: 4, rotorParts: [1], ...d }), 0, w).warnings).toEqual([]);
    }
  });
});
