import { describe, expect, it } from 'vitest';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { renderSummary } from '../../src/views/summary.ts';
import { show } from '../../src/views/display-units.ts';
import { ep5Case } from '../data/ep5-case.ts';
import { withFinding } from '../../src/finding/investigation.ts';
import { twistFindingLines } from '../../src/views/plastic-lines.ts';
import { fixture } from '../report/report-fixtures.ts';

describe('renderSummary past yield and with observations', () => {
  it('shows the plastic result and the overall verdict when the elastic yield ratio is at or above 1', () => {
    const r = withFinding(analyseCase(ep5Case()));
    const text = renderSummary(r);
    expect(text).toMatch(/Past yield by the energy balance \(the finding's model past yield; elastic–perfectly plastic;/);
    expect(text).toContain(`peak torque ${show(r.plastic.sides[0].peakTorque, 'torque', 'metric')}`);
    expect(text).toContain(`permanent twist ${show(r.plastic.sides[0].permanentTwist, 'angle', 'metric')}`);
    expect(text).toMatch(/^Finding: YIELDED THROUGH THE SECTION \(energy method\): .* past yield the torque there is capped at /m);
    expect(text).toMatch(/not applied to the net-section plastic behaviour/);
    expect(text).toMatch(/Cautions:/);
  });

  it('leaves the plastic lines out below yield', () => {
    const text = renderSummary(withFinding(analyseCase(ep5Case({ speed: '100 rpm' }))));
    expect(text).not.toMatch(/Past yield/);
    expect(text).toMatch(/ELASTIC/);
  });

  it("shows the read-back when the case records a twist, with the speed found and the band's basis", () => {
    const r = withFinding(analyseCase(ep5Case({ observed: ['permanent_twist:', '  - { between: [seized bearing, disc], angle: 0.5 deg }'] })));
    const text = renderSummary(r);
    expect(text).toMatch(/Read back from the damage:/);
    expect(text).toContain(`needs a stop from ${show(r.observedFindings.twist[0].speedForMeasured!, 'speed', 'metric', 4)}`);
    expect(text).toMatch(/default band: the case states no tolerance on speed/);
    expect(text).toMatch(/Read-back: LESS than the recorded speed explains/);
  });

  it('shows a fracture reading with its source and the examiner caution', () => {
    const text = renderSummary(withFinding(analyseCase(ep5Case({ observed: ['fracture: { type: fatigue, notes: beach marks }'] }))));
    expect(text).toMatch(/Fracture: fatigue\./);
    expect(text).toMatch(/Source: ASM Handbook Vol\. 11/);
    expect(text).toMatch(/qualified failure examiner/);
  });
});

describe('the read-back lines in check', () => {
  it('never build the speed → twist curve (each point a rerun of the model; only the report draws it)', () => {
    const f = fixture('sample').results.observedFindings.twist[0];
    const untouched = Object.create(Object.getPrototypeOf(f), Object.getOwnPropertyDescriptors(f));
    Object.defineProperty(untouched, 'curve', {
      get() {
        throw new Error('the curve was built');
      },
    });
    expect(f.loadedShaft).toBe(true);
    expect(twistFindingLines(untouched, 'metric').join('\n')).toMatch(/Read-back:/);
  });
});
