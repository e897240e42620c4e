import { describe, expect, it } from 'vitest';
import { ratedSpeedChecks } from '../../src/resize/rated-speed.ts';
import { caseOf } from '../helpers/layout.ts';

const c = (rated: string, ratio = 1) =>
  caseOf({
    rpm: 3000,
    segments: [[300, 30, 0]],
    stations: [
      ['jam', 0, 0],
      ['wheel', 300, 0, `    parts:\n      - { shape: inertia, name: cut-off wheel, inertia: 0.05 kg*m^2, speed_ratio: ${ratio}, rated_speed: ${rated} }`],
    ],
    stop: 'jam',
  });

describe('a wheel never runs above the speed marked on it (ANSI B7.1 Sec. 7.1.1; 29 CFR 1910.215(d)(1))', () => {
  it('a wheel marked above its running speed is within its marking', () => {
    const [w] = ratedSpeedChecks(c('4400 rpm'));
    expect(w).toMatchObject({ station: 'wheel', part: 'cut-off wheel', over: false });
  });

  it("the part's own speed counts: through a speed ratio of 1.6, 3000 rpm becomes 4800 rpm, above a 4400 rpm marking", () => {
    const [w] = ratedSpeedChecks(c('4400 rpm', 1.6));
    expect(w.speed).toBeCloseTo((4800 * 2 * Math.PI) / 60, 9);
    expect(w.over).toBe(true);
  });

  it('parts without a marked speed are not listed', () => {
    expect(
      ratedSpeedChecks(
        caseOf({
          rpm: 300,
          segments: [[300, 30, 0]],
          stations: [
            ['jam', 0, 0],
            ['d', 300, 1],
          ],
          stop: 'jam',
        }),
      ),
    ).toEqual([]);
  });
});
