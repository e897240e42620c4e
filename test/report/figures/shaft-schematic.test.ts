import { describe, expect, it } from 'vitest';
import { shaftSchematicFigure } from '../../../src/report/figures/shaft-schematic.ts';
import { fixture } from '../report-fixtures.ts';
import { checkFigure } from './figure-checks.ts';

describe('shaftSchematicFigure', () => {
  it('shaftSchematicFigure draws every segment to scale: width over height equals length over diameter', () => {
    const r = fixture('sample').results;
    const f = shaftSchematicFigure(r)!;
    const doc = checkFigure(f, 'shaft-schematic', [/^position from the shaft's start \(mm\)/, /radius \(mm\)/, /^STOP: rotor$/, /^drive sheave$/]);
    expect(f.caption).toContain('drawn to scale');
    const rects = [...doc.querySelectorAll('g[fill="#b8bec7"] rect')];
    expect(rects).toHaveLength(r.case.shaft.segments.length);
    r.case.shaft.segments.forEach((s, i) => {
      const w = Number(rects[i].getAttribute('width'));
      const h = Number(rects[i].getAttribute('height'));
      expect(w / h).toBeCloseTo((s.end - s.start) / s.diameter, 2);
    });
  });

  it('shaftSchematicFigure draws a bore for a hollow segment and says when radii are not to scale', () => {
    const f = shaftSchematicFigure(fixture('two-sided-pump.yaml').results)!;
    const doc = checkFigure(f, 'shaft-schematic', [/position from the shaft's start \(in\)/, /^STOP: coupling$/]);
    expect(doc.querySelectorAll('g[fill="white"] rect')).toHaveLength(1);
    expect(f.caption).toMatch(/radii drawn [\d.]+ × the length scale/);
  });
});
