import { describe, expect, it } from 'vitest';
import { torqueFromPower } from '../../src/physics/power.ts';

const rpm = (n: number) => (n * 2 * Math.PI) / 60;
const HP = 745.69987158227; // W, NIST SP 811 App. B.8 (derived exactly from ft, lbf and s)

describe('torqueFromPower: T = P/ω (Shigley 9th ed. Sec. 3-12, H = Tω)', () => {
  it('7.5 kW at 1460 rpm is 9549.3 × 7.5/1460 = 49.055 N·m (REFERENCE 9.6, derived; printed there rounded to 49.06)', () => {
    expect(Math.abs(torqueFromPower(7500, rpm(1460)) / 49.055 - 1)).toBeLessThan(2e-5);
  });

  it('10 hp at 1760 rpm is 29.842 lbf·ft = 40.46 N·m (REFERENCE 9.6; T = 5252.1·hp/rpm lbf·ft)', () => {
    const T = torqueFromPower(10 * HP, rpm(1760));
    expect(T / 1.3558179483314).toBeCloseTo(29.842, 3);
    expect(T).toBeCloseTo(40.46, 2);
  });

  it('matches T[N·m] = 9549.3·P[kW]/n[rpm] for any power and speed (REFERENCE 1.1.9, 60 000/2π)', () => {
    for (const [kw, n] of [
      [0.37, 2850],
      [22, 1475],
      [250, 990],
      [3, 40],
    ]) {
      expect(torqueFromPower(kw * 1e3, rpm(n)) / ((9549.2966 * kw) / n)).toBeCloseTo(1, 7);
    }
  });
});
