import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { caseText, run } from '../helpers/layout.ts';

// One disc (1 kg·m²) on a 50 mm × 500 mm steel shaft at 300 rpm, stopped at the other end. Its hub
// is shrunk on: 0.05 mm diametral interference, hub Ø100 mm of the same steel, 60 mm long, μ = 0.12,
// so p = 77.625 MPa and T_slip = 2194.79 N·m (test/physics/interference-fit.test.ts; Shigley 9th
// ed. Eq. 3-57 and Sec. 7-8, from memory). The elastic peak would be ω0·√(J·k) ≈ 9.8 kN·m, so the fit slips.
const FIT = '    fit: { interference: 0.05 mm, hub_outer_diameter: 100 mm, length: 60 mm, friction: FRICTION, hub_material: aisi-1045-cd }';
const layout = (friction: number, extra = {}) => ({
  rpm: 300,
  segments: [[500, 50, 0]] as [number, number, number][],
  stations: [
    ['jam', 0, 0],
    ['disc', 500, 1, FIT.replace('FRICTION', String(friction))],
  ] as [string, number, number, string?][],
  stop: 'jam',
  ...extra,
});
const SLIP = 2194.79;

describe('hubFits: a shrink fit at the incident torque', () => {
  const { r } = run(layout(0.12));
  const fit = r.fits[0];

  it('reports the Lamé contact pressure and the slip torque (within 0.5 % of the hand calculation) and that it slipped', () => {
    expect(Math.abs(fit.contactPressure / 77.625e6 - 1)).toBeLessThan(0.005);
    expect(Math.abs(fit.slipTorque / SLIP - 1)).toBeLessThan(0.005);
    expect(fit.slipped).toBe(true);
    expect(fit.inDynamicModel).toBe(true);
    expect(r.verdictBasis).toBe('dynamic model');
  });

  it('limits the torque like a slip element: the same peak torque and slip energy, within 0.5 %, as a limiter of that setting in the segment', () => {
    const text = caseText({
      ...layout(0.12),
      stations: [
        ['jam', 0, 0],
        ['disc', 500, 1],
      ],
    }).replace('diameter: 50 mm }', `diameter: 50 mm, slip_torque: ${SLIP} N*m }`);
    const limiter = analyseCase(parseCase(text));
    expect(limiter.fits).toEqual([]);
    expect(Math.abs(r.dynamic.peakTorque / limiter.dynamic.peakTorque - 1)).toBeLessThan(0.005);
    const a = r.dynamic.slips.find((s) => s.kind === 'hub fit')!;
    const b = limiter.dynamic.slips.find((s) => s.kind === 'torque limiter')!;
    expect(Math.abs(a.energy / b.energy - 1)).toBeLessThan(0.005);
    expect(a.element).toBe('the shrink fit at "disc"');
  });

  it("the fit takes the energy a limiter would: ½Jω0² − T_s²/(2k) (shared reference 10.11, derived), within 2 % with the model's small damping", () => {
    const slip = r.dynamic.slips.find((s) => s.kind === 'hub fit')!;
    const k = (79.3e9 * Math.PI * 0.05 ** 4) / 32 / 0.5;
    const w = (300 * 2 * Math.PI) / 60;
    const expected = 0.5 * 1 * w * w - SLIP ** 2 / (2 * k);
    expect(Math.abs(slip.energy / expected - 1)).toBeLessThan(0.02);
  });

  it('a fit that grips well enough holds, and the shaft carries the elastic peak', () => {
    const firm = run(layout(1.5)).r;
    expect(firm.fits[0].slipped).toBe(false);
    expect(firm.dynamic.peakTorque).toBeGreaterThan(3 * SLIP);
    expect(firm.fits[0].torque).toBeCloseTo(firm.dynamic.peakTorque, 6);
  });
});
