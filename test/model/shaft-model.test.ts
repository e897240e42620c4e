import { describe, expect, it } from 'vitest';
import type { Segment, Station } from '../../src/case/case.ts';
import { cutAtStations } from '../../src/model/shaft-model.ts';
import { parseCase } from '../../src/case/parse-case.ts';
import { buildShaftModel } from '../../src/model/shaft-model.ts';

const seg = (index: number, start: number, end: number): Segment => ({ index, start, end, diameter: 0.05, bore: 0, material: 'aisi-1045-cd', kt: 1 });
const st = (name: string, at: number): Station => ({ name, at, parts: [] });

describe('cutAtStations', () => {
  it('cuts segments at stations inside them and nowhere else', () => {
    const pieces = cutAtStations([seg(0, 0, 0.3), seg(1, 0.3, 1)], [st('a', 0), st('b', 0.5), st('c', 0.3)]);
    expect(pieces.map((p) => [p.segment.index, p.start, p.end])).toEqual([
      [0, 0, 0.3],
      [1, 0.3, 0.5],
      [1, 0.5, 1],
    ]);
  });

  it('leaves no sliver where a station sits on a boundary that carries rounding', () => {
    const pieces = cutAtStations([seg(0, 0, 0.1 + 0.2), seg(1, 0.1 + 0.2, 1)], [st('a', 0.3)]);
    expect(pieces).toHaveLength(2);
  });
});

describe('buildShaftModel', () => {
  const text = (stop: string) => `case: { id: M }
speed: 100 rpm
stop: { at: ${stop} }
shaft:
  material: aisi-1045-cd
  segments: [{ length: 1 m, diameter: 50 mm }]
stations:
  - { name: left, at: 0 m, parts: [{ shape: inertia, inertia: 1 kg*m^2 }] }
  - { name: mid, at: 0.4 m }
  - { name: right, at: 1 m, parts: [{ shape: inertia, inertia: 1 kg*m^2 }] }
`;

  it('a stop between two loaded stations makes two sides, each with the shaft between', () => {
    const m = buildShaftModel(parseCase(text('mid')));
    expect(m.sides.map((s) => [s.side, s.pieces.map((p) => [p.start, p.end])])).toEqual([
      ['A', [[0, 0.4]]],
      ['B', [[0.4, 1]]],
    ]);
  });

  it("a stop at a shaft end leaves one side, and the stopped station's parts release nothing", () => {
    const m = buildShaftModel(parseCase(text('left')));
    expect(m.sides.map((s) => s.side)).toEqual(['B']);
    expect(m.sides[0].stations.map((s) => s.name)).toEqual(['right']);
  });
});
