import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../../src/case/parse-case.ts';
import { torqueTwistFigure } from '../../../src/report/figures/torque-twist-curve.ts';
import { analyseCase } from '../../../src/results/analyse-case.ts';
import { show } from '../../../src/views/display-units.ts';
import { ep5Case } from '../../data/ep5-case.ts';
import { parseSvg } from './parse-svg.ts';

const marks = (root: Element) => [...root.querySelectorAll('[aria-description]')].map((e) => e.getAttribute('aria-description'));
const granulator = readFileSync(new URL('../../../sample-cases/granulator-tramp-metal.yaml', import.meta.url), 'utf8');

describe('torqueTwistFigure where the verdict past yield stands on the dynamic model', () => {
  const r = analyseCase(parseCase(granulator), { readBack: false });
  const fig = torqueTwistFigure(r)!;

  it("draws the piece's path in time and its permanent twist, with the dynamic model's numbers in the caption", () => {
    expect(r.pastYieldBasis).toBe('dynamic model');
    const path = r.dynamic.yieldPath!;
    const p = r.dynamic.pieces[path.piece];
    expect(p.permanentTwist).toBeGreaterThan(0);
    expect(marks(parseSvg(fig.svg))).toEqual(expect.arrayContaining(['path in time', 'permanent twist', 'peak torque']));
    expect(fig.caption).toContain(`permanent twist of ${show(p.permanentTwist, 'angle', 'metric')}`);
    expect(fig.caption).toContain(`capped by plasticity at ${show(p.peakTorque, 'torque', 'metric')}`);
    // The piece's plastic work is part of the shaft's, which closes the energy books (dynamic-result tests).
    expect(path.plasticWork).toBeGreaterThan(0);
    expect(path.plasticWork).toBeLessThanOrEqual(r.dynamic.plasticWork * (1 + 1e-12));
    expect(fig.caption).toContain(`turned ${show(path.plasticWork, 'energy', 'metric')} into heat by plastic flow`);
  });

  it("its path stays within the piece's fully plastic torque, and it ends twisted about the permanent twist (the elastic ringing around it)", () => {
    const path = r.dynamic.yieldPath!;
    const p = r.dynamic.pieces[path.piece];
    const seg = p.piece.segment;
    // Fully plastic torque of a solid section, T_P = (2π/3)·τ_Y·c³ (Beer & Johnston, Mechanics of Materials, Sec. 3.9; from memory, confident).
    const tp = ((2 * Math.PI) / 3) * p.shearYield * (seg.diameter / 2) ** 3;
    for (const t of path.torque) expect(Math.abs(t)).toBeLessThanOrEqual(tp * (1 + 1e-9));
    // At the window's end the piece rings elastically about its permanent twist: twist − T/k is the permanent twist.
    // G = 79.3 GPa for carbon steel (Shigley 9th ed. Table A-5; from memory, confident).
    const k = (79.3e9 * Math.PI * seg.diameter ** 4) / 32 / (p.piece.end - p.piece.start);
    const last = path.twist.length - 1;
    expect(Math.abs(path.twist[last] - path.torque[last] / k - p.permanentTwist)).toBeLessThan(0.02 * p.permanentTwist);
  });

  it("is the energy balance's figure where the verdict stands on the energy method (one mass, an instant stop)", () => {
    expect(torqueTwistFigure(analyseCase(ep5Case()))!.title).toMatch(/most strained piece \(side [AB]\)$/);
  });
});
