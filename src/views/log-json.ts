import type { IncidentLog } from '../log/build-log.ts';
import { SCHEMA_VERSION } from './schema-version.ts';

/**
 * `log --json`: the incidents and the rollups per asset, SI, `damage` the Miner fraction of the
 * crack-initiation life. The keys are a contract (issue 16).
 */
export function logToJson(log: IncidentLog): Record<string, unknown> {
  return {
    schema_version: SCHEMA_VERSION,
    incidents: log.incidents.map((r) => ({
      id: r.id,
      asset: r.asset,
      occurred: r.occurred,
      verdict: r.verdict,
      basis: r.basis,
      side: r.side,
      segment: r.segment,
      yield_ratio: r.yield_ratio,
      peak_torque_Nm: r.peak_torque_Nm,
      permanent_twist_rad: r.permanent_twist_rad,
      measured_twist_rad: r.measured_twist_rad,
      damage: r.damage,
      report: r.report,
    })),
    assets: log.assets.map((a) => ({ asset: a.asset, incidents: a.incidents, worst_yield_ratio: a.worst_yield_ratio, mean_interval_days: a.mean_interval_days, damage: a.damage })),
  };
}
