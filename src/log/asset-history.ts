import type { AssetFinding } from './asset-finding.ts';
import type { IncidentLog } from './build-log.ts';

/** A case's place in its asset's history, as the log finds it. */
export interface AssetHistory {
  asset: string;
  /** This incident's place among the asset's incidents in the order they occurred, 1-based. */
  position: number;
  incidents: number;
  /** This incident's damage, and the asset's Miner sum with it. */
  incidentDamage: number;
  assetDamage: number;
  finding: AssetFinding;
  /** The folder searched for the asset's other cases. */
  searched: string;
  /** The other incidents: id and date, in order. */
  others: { id: string; occurred: string | null; damage: number }[];
}

/** The place of the case `caseFile` in its asset's history; undefined where the log has no row of it under an asset. */
export function assetHistory(log: IncidentLog, caseFile: string, searched: string): AssetHistory | undefined {
  const own = log.incidents.find((r) => r.case_file === caseFile);
  if (!own || own.asset === null) return undefined;
  const rollup = log.assets.find((a) => a.asset === own.asset);
  if (!rollup) return undefined;
  const rows = log.incidents.filter((r) => r.asset === own.asset);
  return {
    asset: own.asset,
    position: rows.indexOf(own) + 1,
    incidents: rows.length,
    incidentDamage: own.damage,
    assetDamage: rollup.damage,
    finding: rollup.finding,
    searched,
    others: rows.filter((r) => r !== own).map((r) => ({ id: r.id, occurred: r.occurred, damage: r.damage })),
  };
}
