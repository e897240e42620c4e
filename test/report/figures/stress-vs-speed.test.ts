import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stressVsSpeedFigure, yieldOnsetSpeed } from '../../../src/report/figures/stress-vs-speed.ts';
import { analyseCase } from '../../../src/results/analyse-case.ts';
import { fixture } from '../report-fixtures.ts';
import { checkFigure } from './figure-checks.ts';

describe('stressVsSpeedFigure', () => {
  it('stressVsSpeedFigure has its title, caption and axes with units', () => {
    const f = stressVsSpeedFigure(fixture('sample').results)!;
    checkFigure(f, 'stress-vs-speed', [/^speed at the stop \(rpm\)/, /shear stress \(MPa\)/, /^incident, 420 rpm$/, /^yield begins, /]);
  });

  // An independent check by the engine itself: run at the onset speed, the governing piece is just at yield.
  it.each(['sample', 'two-sided-pump.yaml', 'elastic-fan.yaml'])('yieldOnsetSpeed(%s) is the speed at which the engine gives a yield ratio of 1', (name) => {
    const r = fixture(name).results;
    expect(analyseCase({ ...r.case, speed: yieldOnsetSpeed(r) }).yieldRatio).toBeCloseTo(1, 10);
  });

  // The law the onset speed relies on: in the elastic energy method every stress scales with the speed.
  it("the engine's stresses scale in proportion to the speed at the stop", () => {
    const r = fixture('two-sided-pump.yaml').results;
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 10, noNaN: true }), (k) => {
        const scaled = analyseCase({ ...r.case, speed: k * r.speed });
        scaled.sides.forEach((s, i) => s.pieces.forEach((p, j) => expect(p.shearStress / r.sides[i].pieces[j].shearStress).toBeCloseTo(k, 9)));
      }),
    );
  });

  it('stressVsSpeedFigure says when yield lies beyond 1.5 × the incident speed and draws no onset line', () => {
    const r = fixture('elastic-fan.yaml').results;
    const f = stressVsSpeedFigure(r)!;
    expect(yieldOnsetSpeed(r)).toBeGreaterThan(1.5 * r.speed);
    expect(f.caption).toMatch(/yield would begin only at \d+ rpm, beyond the plotted range/);
    expect(f.svg).not.toContain('yield begins');
  });
});
