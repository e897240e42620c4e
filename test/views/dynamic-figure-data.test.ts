import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { modeShapeData, stationSpeedData, torqueHistoryData } from '../../src/views/dynamic-figure-data.ts';

const r = analyseCase(parseCase(readFileSync(new URL('../../sample-cases/roll-line-limiter-two-sides.yaml', import.meta.url), 'utf8')));

describe('figure data from Results', () => {
  it('torque history: the most loaded piece and each slip element, in ms and N·m', () => {
    const d = torqueHistoryData(r);
    const names = [...new Set(d.points.map((p) => p.series))];
    expect(names).toEqual(r.dynamic.histories.torques.map((s) => s.name));
    expect(names[0]).toMatch(/most loaded/);
    expect(d.xLabel).toMatch(/ms/);
    const first = d.points.filter((p) => p.series === names[0]);
    expect(first[first.length - 1].x).toBeCloseTo(r.dynamic.duration * 1000, 6);
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
