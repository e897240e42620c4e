import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { withFinding } from '../../src/finding/investigation.ts';
import { modeShapeData, stationSpeedData, torqueHistoryData } from '../../src/views/dynamic-figure-data.ts';

const sample = (f: string) => withFinding(analyseCase(parseCase(readFileSync(new URL(`../../sample-cases/${f}`, import.meta.url), 'utf8'))));
const r = sample('roll-line-limiter-two-sides.yaml');

describe('figure data from Results', () => {
  it("torque history: the finding's governing piece and each slip element, in ms and N·m", () => {
    const d = torqueHistoryData(r);
    const names = [...new Set(d.points.map((p) => p.series))];
    expect(names.slice(1)).toEqual(r.dynamic.histories.torques.map((s) => s.name));
    expect(names[0]).toMatch(/the finding's governing piece/);
    expect(d.xLabel).toMatch(/ms/);
    const first = d.points.filter((p) => p.series === names[0]);
    expect(first[first.length - 1].x).toBeCloseTo(r.dynamic.duration * 1000, 6);
  });

  it("the piece named in the torque history is the finding's governing piece, not the one of highest peak torque (granulator)", () => {
    const g = sample('granulator-tramp-metal.yaml');
    // The dynamic model's highest peak torque is in "rotor body"; the finding governs by stress / shear yield, "sheave seat".
    const top = g.dynamic.pieces.reduce((a, b) => (b.peakTorque > a.peakTorque ? b : a));
    expect(top.piece.segment.label).toBe('rotor body');
    expect(g.finding.piece.segment.label).toBe('sheave seat');
    const d = torqueHistoryData(g);
    const first = d.points[0].series;
    expect(first).toBe('shaft "sheave seat" (the finding\'s governing piece)');
    // Its curve is that piece's: its largest value is the piece's peak torque as carried.
    const peak = Math.max(...d.points.filter((p) => p.series === first).map((p) => Math.abs(p.y)));
    const piece = g.dynamic.pieces.find((p) => p.piece.segment.label === 'sheave seat')!;
    expect(peak / piece.peakTorque).toBeGreaterThan(0.9);
    expect(peak / piece.peakTorque).toBeLessThanOrEqual(1 + 1e-9);
  });

  it('station speeds in rpm, starting at the speed at the stop', () => {
    const d = stationSpeedData(r);
    const start = d.points.filter((p) => p.x === 0);
    for (const p of start) expect(p.y).toBeCloseTo(300, 9);
    expect(d.yLabel).toMatch(/rpm/);
  });

  it('mode shapes: three modes along the shaft in mm, the largest amplitude 1', () => {
    const d = modeShapeData(r);
    const names = [...new Set(d.points.map((p) => p.series))];
    expect(names).toHaveLength(3);
    for (const n of names) expect(Math.max(...d.points.filter((p) => p.series === n).map((p) => p.y))).toBeCloseTo(1, 12);
    expect(Math.max(...d.points.map((p) => p.x))).toBeLessThanOrEqual(2050);
  });
});
