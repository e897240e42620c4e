import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { assetFinding } from '../../src/log/asset-finding.ts';
import { buildLog } from '../../src/log/build-log.ts';
import type { IncidentRow } from '../../src/log/incident-row.ts';
import { occurredTime } from '../../src/log/occurred-time.ts';

const row = (id: string, asset: string | null, occurred: string | null, damage: number, extra: Partial<IncidentRow> = {}): IncidentRow => ({
  id,
  asset,
  occurred,
  machine: null,
  verdict: 'yielded locally',
  basis: 'dynamic model',
  side: 'A',
  segment: 'keyseat',
  yield_ratio: 1.2,
  peak_torque_Nm: 1000,
  permanent_twist_rad: null,
  measured_twist_rad: null,
  damage,
  report: null,
  source: 'engine',
  case_file: `${id}.yaml`,
  ...extra,
});

describe('buildLog', () => {
  it("orders an asset's incidents by case.occurred, untagged and undated last", () => {
    const log = buildLog([
      row('C', 'P-1', '2026-05-01', 0.1),
      row('X', null, '2026-01-01', 0.1),
      row('A', 'P-1', '2026-01-10', 0.1),
      row('N', 'P-1', null, 0.1),
      row('B', 'P-1', '2026-03-01T10:00', 0.1),
    ]);
    expect(log.incidents.map((r) => r.id)).toEqual(['A', 'B', 'C', 'N', 'X']);
  });

  it('rolls up per asset: count, worst ratio, mean interval in days, the Miner sum', () => {
    const log = buildLog([
      row('A', 'P-1', '2026-01-01', 0.1, { yield_ratio: 0.9 }),
      row('B', 'P-1', '2026-01-11', 0.25, { yield_ratio: 1.7 }),
      row('C', 'P-1', '2026-01-31', 0.05),
      row('D', 'Q-2', '2026-02-01', 0.5),
    ]);
    const p = log.assets.find((a) => a.asset === 'P-1')!;
    expect(p.incidents).toBe(3);
    expect(p.worst_yield_ratio).toBe(1.7);
    expect(p.mean_interval_days).toBeCloseTo(15, 12); // (30 days) / 2 intervals
    expect(p.damage).toBeCloseTo(0.4, 15);
    expect(log.assets.find((a) => a.asset === 'Q-2')!.mean_interval_days).toBeNull();
  });

  it("the Miner sum of each asset equals the sum of its incidents' damages (a law)", () => {
    const asset = fc.constantFrom('P-1', 'Q-2', 'R-3');
    fc.assert(
      fc.property(fc.array(fc.tuple(asset, fc.double({ min: 0, max: 0.5, noNaN: true })), { minLength: 1, maxLength: 20 }), (items) => {
        const log = buildLog(items.map(([a, d], i) => row(`I-${i}`, a, `2026-01-${String((i % 28) + 1).padStart(2, '0')}`, d)));
        for (const a of log.assets) {
          const sum = log.incidents.filter((r) => r.asset === a.asset).reduce((s, r) => s + r.damage, 0);
          expect(a.damage).toBeCloseTo(sum, 12);
          expect(a.incidents).toBe(log.incidents.filter((r) => r.asset === a.asset).length);
        }
      }),
      { numRuns: 50 },
    );
  });

  it('no incidents: an empty log', () => {
    expect(buildLog([])).toEqual({ incidents: [], assets: [] });
  });
});

describe('assetFinding', () => {
  it('says the share used and how many more jams like the worst one reach 1', () => {
    const f = assetFinding({ asset: 'head shaft', incidents: 5, damage: 0.4, worst_damage: 0.08, segments: ['keyseat'] });
    // (1 − 0.4) / 0.08 = 7.5 → about 7 more.
    expect(f.sentence).toBe('head shaft\'s "keyseat" has used about 40 % of its crack-initiation life in 5 jams; at this rate about 7 more jams like the worst one.');
    expect(f.jamsLeft).toBe(7);
  });

  it('past 1, a crack test decides', () => {
    const f = assetFinding({ asset: 'P-1', incidents: 3, damage: 1.2, worst_damage: 0.5, segments: ['fillet'] });
    expect(f.inspect).toBe(true);
    expect(f.sentence).toMatch(/crack test decides/);
  });
});

describe('occurredTime', () => {
  it('reads a date without a zone as UTC midnight, and a date-time with its zone', () => {
    expect(occurredTime('2026-01-02')).toBe(Date.UTC(2026, 0, 2));
    expect(occurredTime('2026-01-02T06:00')).toBe(Date.UTC(2026, 0, 2, 6));
    expect(occurredTime('2026-01-02T06:00+01:00')).toBe(Date.UTC(2026, 0, 2, 5));
    expect(occurredTime(null)).toBeNull();
  });
});
