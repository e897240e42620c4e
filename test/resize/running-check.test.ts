import { describe, expect, it } from 'vitest';
import { runningTorque } from '../../src/results/running-torque.ts';
import { runningCheck } from '../../src/resize/running-check.ts';
import { caseOf, rel } from '../helpers/layout.ts';

const tauY = 530e6 / Math.sqrt(3); // 1045 CD (Shigley 9th ed. Table A-20), distortion energy (Sec. 5-5)
const c = (drive?: string) =>
  caseOf({
    rpm: 100,
    segments: [
      [100, 40, 0, 2],
      [400, 50, 0],
    ],
    stations: [
      ['drive', 0, 2, drive && `    drive: ${drive}`],
      ['jam', 500, 0],
    ],
    stop: 'jam',
  });

describe('the normal running check', () => {
  it('static: shear yield over the nominal stress 16T/(πd³) at the smallest section; with kt: divided by kt', () => {
    const x = c('{ running_torque: 400 N*m }');
    const k = runningCheck(x, runningTorque(x), 1.5);
    const nominal = (16 * 400) / (Math.PI * 0.04 ** 3); // Shigley 9th ed. Sec. 3-12 (REFERENCE 1.1.3)
    expect(rel(k.factorStatic!, tauY / nominal)).toBeLessThan(1e-12);
    expect(rel(k.factorWithKt!, tauY / nominal / 2)).toBeLessThan(1e-12);
    expect(k.keeps).toBe(k.factorWithKt! >= 1.5);
  });

  it('says nothing when the case gives no running torque', () => {
    const x = c();
    expect(runningCheck(x, runningTorque(x), 1.5)).toEqual({});
  });

  it('a running torque that leaves less than N with kt does not keep the factor', () => {
    const x = c('{ running_torque: 1500 N*m }');
    expect(runningCheck(x, runningTorque(x), 1.5).keeps).toBe(false);
  });
});
