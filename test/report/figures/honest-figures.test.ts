// Issue 14, item 3: each figure says what its values are and draws what it claims.
import { readFileSync } from 'node:fs';
import { parseHTML } from 'linkedom';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../../src/case/parse-case.ts';
import { investigate } from '../../../src/finding/investigate.ts';
import { placeLabels } from '../../../src/report/figures/label-layout.ts';
import { dynamicSpeedsFigure } from '../../../src/report/figures/dynamic-speeds.ts';
import { dynamicTorqueFigure } from '../../../src/report/figures/dynamic-torque.ts';
import { permanentTwistSpeedFigures } from '../../../src/report/figures/permanent-twist-speed.ts';
import { shaftSchematicFigure } from '../../../src/report/figures/shaft-schematic.ts';
import { stressAlongShaftFigure } from '../../../src/report/figures/stress-along-shaft.ts';
import { stressVsSpeedFigure } from '../../../src/report/figures/stress-vs-speed.ts';
import { ringsOn } from '../../../src/views/ringing.ts';
import { fixture } from '../report-fixtures.ts';
import { xScaleFromTicks } from './figure-checks.ts';

const doc = (svg: string) => parseHTML(`<html><body>${svg}</body></html>`).document as unknown as Document;

describe('honest figures', () => {
  it('the schematic draws each disc centred at its station, as wide as it is thick, within a pixel (granulator)', () => {
    const r = fixture('sample').results;
    const f = shaftSchematicFigure(r)!;
    const d = doc(f.svg);
    const x = xScaleFromTicks(d);
    const sheave = r.case.stations.find((s) => s.name === 'drive sheave')!;
    const disc = sheave.parts.find((p) => p.shape === 'disc')!;
    const rect = [...d.querySelectorAll('g[fill="#d9c7a3"] rect')][0];
    const left = Number(rect.getAttribute('x'));
    const width = Number(rect.getAttribute('width'));
    // Positions in mm: the sheave (70 mm thick) sits at 60 mm, from 25 mm to 95 mm.
    expect(Math.abs(left - x(sheave.at * 1000 - (disc.dimensions.thickness * 1000) / 2))).toBeLessThan(1);
    expect(Math.abs(left + width - x(sheave.at * 1000 + (disc.dimensions.thickness * 1000) / 2))).toBeLessThan(1);
    expect(Math.abs(left + width / 2 - x(sheave.at * 1000))).toBeLessThan(1);
    // Hover values through SVG <title> elements.
    expect(rect.querySelector('title')!.textContent).toMatch(/^cast sheave: 70 × Ø450 mm, centred at 60$/);
  });

  it("labels never overlap one another nor run past the figure's edges, however crowded", () => {
    const items = [0, 3, 6, 400, 690, 700, 715].map((px, i) => ({ px, text: `STOP: inlet flight ${i}` }));
    const placed = placeLabels(
      items,
      (t) => t.px,
      (t) => t.text,
      720,
    );
    for (const p of placed) {
      expect(p.left).toBeGreaterThanOrEqual(0);
      expect(p.right).toBeLessThanOrEqual(720);
    }
    for (const a of placed) for (const b of placed) if (a !== b && a.row === b.row) expect(a.right <= b.left || b.right <= a.left).toBe(true);
    expect(placed.find((p) => p.item.px === 715)!.anchor).toBe('end');
    expect(placed.find((p) => p.item.px === 0)!.anchor).toBe('start');
  });

  it('past yield the elastic stress figures say their values are fictitious and draw the capped value beside them', () => {
    const r = fixture('sample').results;
    for (const f of [stressAlongShaftFigure(r)!, stressVsSpeedFigure(r)!]) {
      expect(f.title).toMatch(/elastic values, fictitious past yield$/);
      expect(f.caption).toMatch(/fictitious/);
      expect(f.svg).toContain('elastic: fictitious past yield');
      // The capped line never rises above shear yield; the elastic one does.
      expect(f.svg).toMatch(/aria-label="line" aria-description="capped stress"|aria-description="capped stress"/);
    }
    const elastic = fixture('elastic-fan.yaml').results;
    expect(stressAlongShaftFigure(elastic)!.title).toBe('Shear stress along the shaft at the stop');
    expect(stressAlongShaftFigure(elastic)!.svg).not.toContain('capped stress');
  });

  it('twist against speed shades the ± band on the measured twist where the case states one', () => {
    const text = readFileSync(fixture('sample').path, 'utf8').replace('angle: 4 deg', 'angle: 4 deg ± 1 deg');
    const r = investigate(parseCase(text), { samples: 0 });
    const [f] = permanentTwistSpeedFigures(r);
    const d = doc(f.svg);
    const band = d.querySelector('[aria-description="measured twist band"] rect')!;
    expect(band).not.toBeNull();
    expect(band.querySelector('title')!.textContent).toBe('measured 4° ± 1°');
    expect(f.caption).toContain('the measured 4° ± 1° (its band shaded green across)');
    // Its height spans 3° to 5° on the y scale the tick labels give.
    const ticks = [...d.querySelectorAll('[aria-label="y-axis tick label"] text')].map((t) => ({
      v: Number(t.textContent),
      px: Number(/translate\([-\d.]+,([-\d.]+)\)/.exec(t.getAttribute('transform')!)![1]),
    }));
    const y = (v: number) => ticks[0].px + ((v - ticks[0].v) * (ticks[ticks.length - 1].px - ticks[0].px)) / (ticks[ticks.length - 1].v - ticks[0].v);
    expect(Math.abs(Number(band.getAttribute('y')) - y(5))).toBeLessThan(1);
    expect(Math.abs(Number(band.getAttribute('y')) + Number(band.getAttribute('height')) - y(3))).toBeLessThan(1);
    // Without a stated tolerance, no band, and the caption says so.
    const [plain] = permanentTwistSpeedFigures(fixture('sample').results);
    expect(plain.svg).not.toContain('measured twist band');
    expect(plain.caption).toContain('(the case states no ± on it)');
  });

  it("the torque figure names the finding's governing piece, not the piece of highest peak torque", () => {
    const r = fixture('sample').results;
    const f = dynamicTorqueFigure(r);
    expect(f.svg).toContain('— shaft "sheave seat" (the finding\'s governing piece)');
    expect(f.svg).not.toContain('rotor body');
    expect(f.svg).not.toContain('most loaded');
  });

  it("a time history that rings on to the end of its window says so, with the model's damping", () => {
    const r = fixture('sample').results;
    const f = dynamicSpeedsFigure(r);
    expect(f.caption).toMatch(/Rings on at about constant amplitude to the end of the 231 ms window: drive sheave \(about ±[\d.]+ rpm\)\. The model's only damping is 0\.5 % of critical/);
    // The rule itself: a steady sine rings on, a decayed one does not, a still one does not.
    const n = 400;
    const sine = Array.from({ length: n }, (_, i) => 50 * Math.sin(i / 3));
    expect(ringsOn(sine)).toBeCloseTo(50, 0);
    expect(ringsOn(sine.map((v, i) => v * Math.exp(-i / 40)))).toBeUndefined();
    expect(ringsOn(Array.from({ length: n }, () => 7))).toBeUndefined();
  });
});
