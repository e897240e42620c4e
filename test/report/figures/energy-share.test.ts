import { describe, expect, it } from 'vitest';
import { energyShareFigure } from '../../../src/report/figures/energy-share.ts';
import { fixture } from '../report-fixtures.ts';
import { checkFigure } from './figure-checks.ts';

describe('energyShareFigure', () => {
  it("energyShareFigure draws one bar per part, their lengths in the ratio of the parts' energies", () => {
    const r = fixture('two-sided-pump.yaml').results;
    const doc = checkFigure(energyShareFigure(r)!, 'energy-share', [/^share of the kinetic energy at the stop \(%\)/, /^A · impeller · impeller$/, /^B · motor · flywheel ×2$/]);
    const widths = [...doc.querySelectorAll('g[aria-label="bar"] rect')].map((b) => Number(b.getAttribute('width')));
    const energies = r.sides.flatMap((s) => s.parts.map((p) => p.kineticEnergy));
    expect(widths).toHaveLength(2);
    expect(widths[0] / widths[1]).toBeCloseTo(energies[0] / energies[1], 3);
  });
});
