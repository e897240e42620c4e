import { describe, expect, it } from 'vitest';
import { runToStop, shaftRun, weakestPiece } from '../../src/resize/shaft-run.ts';
import { rel, run } from '../helpers/layout.ts';

const layout = {
  rpm: 300,
  segments: [
    [200, 40, 0, 1.8],
    [300, 50, 20],
  ] as [number, number, number, number?][],
  stations: [
    ['jam', 0, 0],
    ['mid', 200, 0],
    ['disc', 500, 2],
  ] as [string, number, number][],
  stop: 'jam',
};

describe('the run of shaft between a station and the stop', () => {
  it('holds the pieces between the two positions, cut at the stations', () => {
    const { c } = run(layout);
    expect(runToStop(c, 'disc').map((p) => [p.piece.start, p.piece.end])).toEqual([
      [0, 0.2],
      [0.2, 0.5],
    ]);
    expect(runToStop(c, 'mid')).toHaveLength(1);
    expect(shaftRun(c, 0.5, 0.5)).toHaveLength(0);
  });

  it("a piece's yield torque is where the engine's stress with kt reaches shear yield", () => {
    const { c, r } = run(layout);
    for (const p of runToStop(c, 'disc')) {
      const engine = r.sides[0].pieces.find((q) => q.piece.start === p.piece.start)!;
      expect(rel(p.yieldTorque, engine.torque / engine.yieldRatio)).toBeLessThan(1e-12);
    }
  });

  it('for a solid segment the yield torque is τy·πd³/(16·kt) (Shigley 9th ed. Sec. 3-12; REFERENCE 3.1.1, T_Y = τ_Y·J/c)', () => {
    const { c } = run(layout);
    const w = weakestPiece(runToStop(c, 'disc'))!;
    const tauY = 530e6 / Math.sqrt(3); // 1045 CD, Shigley 9th ed. Table A-20 (from memory, confident), distortion energy
    expect(w.piece.segment.index).toBe(0);
    expect(rel(w.yieldTorque, (tauY * Math.PI * 0.04 ** 3) / 16 / 1.8)).toBeLessThan(1e-12);
  });
});
