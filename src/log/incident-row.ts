import { SCHEMA_VERSION } from '../views/schema-version.ts';

/**
 * The plant's incident log, across cases: one row per incident read from a case's results (its
 * report's results.json, or `check --json`'s object where the engine ran), rollups per asset with
 * arquero, and the plain-word finding of each asset's fatigue. Pure: the walk and the reading are
 * in src/io/find-cases.ts and src/cli/commands/log.ts.
 */

/** Where an incident's numbers come from. */
export type RowSource = 'report' | 'engine';

/** One incident, SI; the JSON keys of `log --json`. */
export interface IncidentRow {
  id: string;
  asset: string | null;
  /** ISO date or date-time as the case gives it. */
  occurred: string | null;
  machine: string | null;
  verdict: string;
  basis: string;
  side: string;
  /** The governing segment, by its label or "segment N". */
  segment: string;
  /** The finding's stress (kt applied) over shear yield. */
  yield_ratio: number;
  peak_torque_Nm: number;
  permanent_twist_rad: number | null;
  /** The first measured permanent twist, rad; null where none was measured. */
  measured_twist_rad: number | null;
  /** The incident's fatigue damage, the Miner fraction of the crack-initiation life. */
  damage: number;
  /** The report folder the numbers come from; null where the engine ran. */
  report: string | null;
  source: RowSource;
  /** The case file. */
  case_file: string;
}

type Json = Record<string, unknown>;
const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);
const str = (v: unknown): string | null => (typeof v === 'string' ? v : null);

/** The JSON shape a row needs: the results' `finding` and `fatigue` objects. */
export function hasLogFields(j: Json): boolean {
  const f = j.finding as Json | undefined;
  const z = j.fatigue as Json | undefined;
  return j.schema_version === SCHEMA_VERSION && typeof f === 'object' && f !== null && typeof z === 'object' && z !== null && num(z.damage) !== null && num(f.yield_ratio) !== null;
}

/**
 * An incident's row from the results JSON (`check --json`'s object, or a report's results.json) and
 * the case's own fields (asset, date, machine), which are read from the case file as it is now.
 */
export function incidentRow(j: Json, meta: { id: string; asset?: string; occurred?: string; machine?: string }, where: { caseFile: string; report: string | null; source: RowSource }): IncidentRow {
  const f = j.finding as Json;
  const z = j.fatigue as Json;
  const seg = (f.segment ?? {}) as Json;
  const measured = Array.isArray(f.measured_twist) ? (f.measured_twist[0] as Json | undefined) : undefined;
  return {
    id: meta.id,
    asset: meta.asset ?? null,
    occurred: meta.occurred ?? null,
    machine: meta.machine ?? null,
    verdict: str(f.verdict) ?? '',
    basis: str(f.basis) ?? '',
    side: str(f.side) ?? '',
    segment: str(seg.label) ?? `segment ${(num(seg.index) ?? 0) + 1}`,
    yield_ratio: num(f.yield_ratio) ?? 0,
    peak_torque_Nm: num(f.peak_torque_Nm) ?? 0,
    permanent_twist_rad: num(f.permanent_twist_rad),
    measured_twist_rad: measured ? num(measured.measured_rad) : null,
    damage: num(z.damage) ?? 0,
    report: where.report,
    source: where.source,
    case_file: where.caseFile,
  };
}
