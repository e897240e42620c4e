// Gearboxes and backstops through the whole engine: the one-way stop in the dynamic model, the
// rebound it holds, and the gearbox's rating ratio at the incident peak.
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { decideFinding } from '../../src/finding/finding.ts';

/**
 * One shaft, 600 mm × Ø50 mm, stopped at its far end; at its start a station whose parts (a hub
 * of 0.5 kg·m² and a motor rotor of 0.02 kg·m² behind a 20:1 gear unit) drive into the stop. No
 * shaft inertia and no damping, so it is one mass on one spring and the closed forms hold.
 */
const text = (station: string, drive = '    drive: { rotor_inertia: 0.02 kg*m^2, torque: 0 N*m }') => `
case: { id: GB }
speed: 60 rpm
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 600 mm, diameter: 50 mm }
stations:
  - name: reducer
    at: 0 mm
    parts: [{ shape: inertia, name: hub, inertia: 0.5 kg*m^2 }]
${drive}
${station}
  - { name: jam, at: 600 mm }
analysis: { shaft_inertia: false, damping_ratio: 0 %, duration: 400 ms }
`;
const gearbox = (back: boolean) => `    gearbox: { ratio: 20, rated_output_torque: 1.5 kN*m, service_factor: 1.6, efficiency: 0.9, back_drivable: ${back} }`;
const run = (t: string) => {
  const c = parseCase(t);
  return { c, r: analyseCase(c, { readBack: false }) };
};
const speedsAt = (r: ReturnType<typeof analyseCase>, name: string) => r.dynamic.histories.speeds.find((s) => s.name === name)!.values;

/**
 * The independent calculation: J = hub + rotor·i² (the rotor at the gearbox's ratio, else on the
 * shaft), k = G·π·d⁴/(32·L), peak T = ω0·√(J·k) from ½Jω0² = ½kθ² (Den Hartog, Mechanical
 * Vibrations, the undamped single-degree system; from memory, confident).
 */
function closedForm(c: ReturnType<typeof parseCase>) {
  const J = 0.5 + 0.02 * (c.stations[0].gearbox?.ratio ?? 1) ** 2;
  const G = c.materials['aisi-1045-cd'].shearModulus!;
  const k = (G * Math.PI * 0.05 ** 4) / 32 / 0.6;
  return { J, k, peak: c.speed * Math.sqrt(J * k) };
}

describe('a self-locking gearbox (back_drivable: false) in the dynamic model', () => {
  it("stops the motor side turning backwards: its speed never goes below zero after the stop, where a back-drivable one's does", () => {
    const free = run(text(gearbox(true))).r;
    const locked = run(text(gearbox(false))).r;
    const w0 = 2 * Math.PI;
    // Undamped, the back-drivable unit lets the spring throw the motor side back to about −ω0.
    expect(Math.min(...speedsAt(free, 'reducer')) / w0).toBeLessThan(-0.9);
    expect(Math.min(...speedsAt(locked, 'reducer'))).toBeGreaterThanOrEqual(-1e-9 * w0);
    expect(locked.dynamic.events.map((e) => e.text)).toContain('The self-locking gearbox at "reducer" holds the shaft against turning backwards.');
    expect(locked.dynamic.assumptions.join(' ')).toMatch(/self-locking gearbox at "reducer" holds the shaft there at standstill/);
  });

  it('holds the spring torque it is caught at, k·θ = ω0·√(J·k), and is a row of the drive train at that torque', () => {
    const { c, r } = run(text(gearbox(false)));
    const { peak } = closedForm(c);
    const g = r.gearboxes[0];
    expect(g.heldTorque! / peak - 1).toBeCloseTo(0, 3);
    expect(g.outputTorque / peak - 1).toBeCloseTo(0, 3);
    const row = r.driveTrain.find((e) => e.kind === 'gearbox')!;
    expect(row.element).toBe('the gearbox at "reducer" (20:1, self-locking)');
    expect(row.torque / peak - 1).toBeCloseTo(0, 3);
  });
});

describe("a gearbox's rating at the incident peak", () => {
  it('its rating ratio is the torque at its output over rated output torque × service factor, its input torque T_out/(η·i)', () => {
    const { c, r } = run(text(gearbox(true)));
    const { peak } = closedForm(c);
    const g = r.gearboxes[0];
    // The torque at its output is the peak of the shaft next to it, here the one-mass closed form.
    expect(g.outputTorque / peak - 1).toBeCloseTo(0, 3);
    expect(g.capacity).toBeCloseTo(1500 * 1.6, 9);
    expect(g.ratingRatio).toBeCloseTo(g.outputTorque / (1500 * 1.6), 12);
    expect(g.inputTorque).toBeCloseTo(g.outputTorque / (20 * 0.9), 9);
    expect(g.heldTorque).toBeUndefined();
    // The finding orders it with the shaft: here it is the weakest, past its rating.
    const f = decideFinding(r);
    expect(f.weakest?.kind).toBe('gearbox');
    expect(f.weakest?.ratio).toBeCloseTo(g.ratingRatio, 12);
  });
});

describe('a backstop (backstop: true) in the dynamic model', () => {
  it('stops the shaft there turning backwards and holds the rebound k·θ = ω0·√(J·k) of the mass caught at its wound-up twist', () => {
    const without = run(text('')).r;
    const { c, r } = run(text('    backstop: true\n    backstop_rated_torque: 8 kN*m'));
    const { peak } = closedForm(c);
    expect(Math.min(...speedsAt(without, 'reducer')) / (2 * Math.PI)).toBeLessThan(-0.9);
    expect(Math.min(...speedsAt(r, 'reducer'))).toBeGreaterThanOrEqual(-1e-9 * 2 * Math.PI);
    const b = r.backstops[0];
    expect(b.inDynamicModel).toBe(true);
    expect(b.reboundTorque / peak - 1).toBeCloseTo(0, 3);
    // Caught a quarter period after the stop: T_n/4 = (π/2)·√(J/k).
    const { J, k } = closedForm(c);
    expect(b.firstHeld! / ((Math.PI / 2) * Math.sqrt(J / k))).toBeCloseTo(1, 3);
    expect(b.ratio).toBeCloseTo(b.reboundTorque / 8000, 12);
    const row = r.driveTrain.find((e) => e.kind === 'backstop')!;
    expect(row).toMatchObject({ element: 'the backstop at "reducer"', capacity: 8000 });
  });

  it('a backstop at the stop is not in the dynamic model, and a warning says so', () => {
    const t = text('').replace('  - { name: jam, at: 600 mm }', '  - { name: jam, at: 600 mm, backstop: true }');
    const r = run(t).r;
    expect(r.backstops[0]).toMatchObject({ station: 'jam', inDynamicModel: false, reboundTorque: 0 });
    expect(r.warnings.join(' ')).toMatch(/The backstop at "jam" is not in the dynamic model \(it stands at the stop/);
  });
});

describe("a gearbox's output gear by the Lewis equation (a first estimate)", () => {
  it('its bending stress is W_t/(F·m·Y) with W_t = 2T/(m·z) at the torque through its output and Y from the table', () => {
    const t = text(gearbox(true).replace('back_drivable: true', 'back_drivable: true, module: 5 mm, face_width: 50 mm, teeth: 50'));
    const g = run(t).r.gearboxes[0];
    // By hand: d = 5 mm × 50 = 250 mm; W_t = 2T/d; Y(50) = 0.409 (Shigley 9th ed. Table 14-2, from memory).
    const Wt = (2 * g.outputTorque) / 0.25;
    expect(g.tooth!.load).toBeCloseTo(Wt, 6);
    expect(g.tooth!.formFactor).toBe(0.409);
    expect(g.tooth!.bendingStress / (Wt / (0.05 * 0.005 * 0.409))).toBeCloseTo(1, 12);
  });
});
