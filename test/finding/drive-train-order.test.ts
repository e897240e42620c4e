import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { investigate } from '../../src/finding/investigate.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { renderSummary } from '../../src/views/summary.ts';
import { caseText } from '../helpers/layout.ts';

// One disc of 1 kg·m² at 150 rpm on a 50 mm × 500 mm AISI 1045 CD shaft; its hub is driven by a
// small 6 × 6 × 20 mm key of the same steel. The key crushes at S_y·d·h·l/4 = 530 MPa × 0.05 ×
// 0.006 × 0.02 / 4 = 795 N·m and shears off at 0.67·S_ut·d·w·l/2 = 1266 N·m (Shigley 9th ed. Sec.
// 7-7 and 6-15, from memory, confident; arithmetic by hand), far below the shaft's yield torque.
const KEY = '    key: { width: 6 mm, height: 6 mm, length: 20 mm, material: aisi-1045-cd }';
const text = caseText({
  rpm: 150,
  segments: [[500, 50, 0]],
  stations: [
    ['jam', 0, 0],
    ['disc', 500, 1, KEY],
  ],
  stop: 'jam',
});

describe('the finding names the weakest element of the drive train, shaft or not', () => {
  const r = investigate(parseCase(text), { samples: 0 });
  const f = r.finding;

  it("orders the drive train by torque over capacity and puts the key first, with its capacity from Shigley's key relations", () => {
    expect(f.weakest!.kind).toBe('key');
    expect(f.weakest!.order).toBe(1);
    expect(Math.abs(f.weakest!.capacity / 795 - 1)).toBeLessThan(1e-9);
    expect(f.weakest!.givesWayBy).toMatch(/crushes/);
    const shaft = f.driveTrain.find((e) => e.kind === 'shaft')!;
    expect(shaft.ratio).toBeCloseTo(f.yieldRatio, 9);
    expect(f.driveTrain.map((e) => e.order)).toEqual(f.driveTrain.map((_, i) => i + 1));
    for (let i = 1; i < f.driveTrain.length; i++) expect(f.driveTrain[i - 1].ratio).toBeGreaterThanOrEqual(f.driveTrain[i].ratio);
  });

  it('check and --json show the same order, from the finding', () => {
    const json = resultsToJson(r).drive_train as { element: string; order: number; ratio: number; capacity_Nm: number }[];
    expect(json.map((e) => e.element)).toEqual(f.driveTrain.map((e) => e.element));
    expect(json[0]).toMatchObject({ element: 'the key at "disc"', order: 1, station_or_segment: 'disc' });
    const check = renderSummary(r);
    expect(check).toMatch(/In the drive train, the key at "disc" gave way first/);
    expect(check).toMatch(/What gave way first/);
  });

  it('a shrink fit that slips stands first, ahead of a shaft that held', () => {
    const fit = '    fit: { interference: 0.05 mm, hub_outer_diameter: 100 mm, length: 60 mm, friction: 0.12, hub_material: aisi-1045-cd }';
    const g = investigate(
      parseCase(
        caseText({
          rpm: 300,
          segments: [[500, 50, 0]],
          stations: [
            ['jam', 0, 0],
            ['disc', 500, 1, fit],
          ],
          stop: 'jam',
        }),
      ),
      { samples: 0 },
    ).finding;
    expect(g.weakest!.kind).toBe('fit');
    expect(g.weakest!.ratio).toBeGreaterThanOrEqual(1);
  });
});
