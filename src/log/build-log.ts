import * as aq from 'arquero';
import { assetFinding, type AssetFinding } from './asset-finding.ts';
import type { IncidentRow } from './incident-row.ts';
import { DAY_MS, occurredTime } from './occurred-time.ts';

/** One asset's rollup; the JSON keys of `log --json`'s `assets`. */
export interface AssetRollup {
  asset: string;
  incidents: number;
  worst_yield_ratio: number;
  /** Mean days between the dated incidents; null with fewer than two dated. */
  mean_interval_days: number | null;
  /** The Palmgren–Miner sum of the incidents' damages. */
  damage: number;
  /** The largest damage of one incident (the "worst one" of the finding). */
  worst_damage: number;
  /** Governing segments of the incidents, each once. */
  segments: string[];
  finding: AssetFinding;
}

export interface IncidentLog {
  incidents: IncidentRow[];
  assets: AssetRollup[];
}

/**
 * The log: incidents ordered by asset (untagged last), then by `case.occurred` (undated last), then
 * id; and the rollups per asset, made with arquero (count, worst ratio, interval, Miner sum).
 */
export function buildLog(rows: readonly IncidentRow[]): IncidentLog {
  if (rows.length === 0) return { incidents: [], assets: [] };
  const t = aq.from(rows.map((r, i) => ({ ...r, row: i, t: occurredTime(r.occurred), tagged: r.asset === null ? 1 : 0 })));
  const ordered = t.orderby('tagged', 'asset', (d: { t: number | null }) => (d.t === null ? 1 : 0), 't', 'id');
  const incidents = (ordered.objects() as { row: number }[]).map((o) => rows[o.row]);
  const rolled = t
    .filter((d: { tagged: number }) => d.tagged === 0)
    .groupby('asset')
    .rollup({
      incidents: aq.op.count(),
      worst_yield_ratio: (d: { yield_ratio: number }) => aq.op.max(d.yield_ratio),
      damage: (d: { damage: number }) => aq.op.sum(d.damage),
      worst_damage: (d: { damage: number }) => aq.op.max(d.damage),
      dated: (d: { t: number | null }) => aq.op.valid(d.t),
      first: (d: { t: number | null }) => aq.op.min(d.t),
      last: (d: { t: number | null }) => aq.op.max(d.t),
      segments: (d: { segment: string }) => aq.op.array_agg_distinct(d.segment),
    })
    .orderby('asset');
  const assets = (
    rolled.objects() as { asset: string; incidents: number; worst_yield_ratio: number; damage: number; worst_damage: number; dated: number; first: number; last: number; segments: string[] }[]
  ).map((a) => {
    const rollup = {
      asset: a.asset,
      incidents: a.incidents,
      worst_yield_ratio: a.worst_yield_ratio,
      mean_interval_days: a.dated > 1 ? (a.last - a.first) / (a.dated - 1) / DAY_MS : null,
      damage: a.damage,
      worst_damage: a.worst_damage,
      segments: [...a.segments].sort(),
    };
    return { ...rollup, finding: assetFinding(rollup) };
  });
  return { incidents, assets };
}
