// The gearbox and backstop lines of check and the report, and their JSON: rendered from the
// results, nothing recomputed.
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { withFinding } from '../../src/finding/investigation.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { show, sig } from '../../src/views/display-units.ts';
import { backstopSentences, gearboxSentences } from '../../src/views/hub-lines.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { renderSummary } from '../../src/views/summary.ts';

// A worm reducer (self-locking) driving a shaft into a jam, and a backstop on a second station.
const text = `
case: { id: HL }
speed: 60 rpm
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 600 mm, diameter: 50 mm }
stations:
  - name: worm reducer
    at: 0 mm
    parts: [{ shape: inertia, name: wheel hub, inertia: 0.5 kg*m^2 }]
    drive: { rotor_inertia: 0.02 kg*m^2, torque: 0 N*m }
    gearbox: { ratio: 20, rated_output_torque: 1.5 kN*m, service_factor: 1.6, efficiency: 0.6, back_drivable: false }
  - { name: holdback, at: 300 mm, backstop: true, backstop_rated_torque: 20 kN*m, parts: [{ shape: inertia, inertia: 0.1 kg*m^2 }] }
  - { name: jam, at: 600 mm }
analysis: { shaft_inertia: false, damping_ratio: 0 %, duration: 400 ms }
`;
const r = withFinding(analyseCase(parseCase(text), { readBack: false }));

describe('gearbox and backstop lines', () => {
  it("say each gearbox's output and input torque against its rating × service factor, and what a self-locking one held", () => {
    const g = r.gearboxes[0];
    const [line] = gearboxSentences(r);
    expect(line).toContain(`The 20:1 gearbox at "worm reducer" carried ${show(g.outputTorque, 'torque', 'metric')}`);
    expect(line).toContain(`${show(g.inputTorque, 'torque', 'metric')} at its input`);
    expect(line).toContain(`${sig(g.ratingRatio)} × its rated output torque 1500 N·m × service factor 1.6 = 2400 N·m`);
    expect(line).toContain(`Self-locking, it held the shaft against turning back with up to ${show(g.heldTorque!, 'torque', 'metric')}`);
  });

  it('say what rebound each backstop held against its rating, and both appear in check under one heading', () => {
    const b = r.backstops[0];
    expect(b.reboundTorque).toBeGreaterThan(0);
    expect(backstopSentences(r)[0]).toContain(`held a rebound torque of up to ${show(b.reboundTorque, 'torque', 'metric')}, ${sig(b.ratio!)} × its rated 20 kN·m`);
    const summary = renderSummary(r);
    expect(summary).toMatch(/Gearboxes and backstops at the incident torque:\n {2}- The 20:1 gearbox[^\n]*\n {2}- The backstop at "holdback"/);
    expect(summary).toMatch(/the backstop at "holdback"/);
  });

  it('the JSON carries the same numbers, and the drive train rows the finding ordered', () => {
    const j = resultsToJson(r) as { gearboxes: Record<string, unknown>[]; backstops: Record<string, unknown>[]; drive_train: { kind: string; order: number }[] };
    expect(j.gearboxes[0]).toMatchObject({
      station: 'worm reducer',
      back_drivable: false,
      capacity_Nm: 2400,
      output_torque_Nm: r.gearboxes[0].outputTorque,
      held_torque_Nm: r.gearboxes[0].heldTorque,
    });
    expect(j.backstops[0]).toMatchObject({ station: 'holdback', rebound_torque_Nm: r.backstops[0].reboundTorque, rated_torque_Nm: 20_000, in_dynamic_model: true });
    expect(j.drive_train.map((e) => e.kind)).toEqual(r.finding.driveTrain.map((e) => e.kind));
    expect(j.drive_train.map((e) => e.kind)).toEqual(expect.arrayContaining(['gearbox', 'backstop']));
  });
});
