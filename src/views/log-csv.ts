import * as aq from 'arquero';
import type { IncidentLog } from '../log/build-log.ts';
import { guardCell } from '../report/tables-csv.ts';
import { logToJson } from './log-json.ts';

/** `log --csv`: one row per incident, the columns and values of `log --json`'s incidents (full precision, empty for none). */
export function logToCsv(log: IncidentLog): string {
  const rows = logToJson(log).incidents as Record<string, string | number | null>[];
  const names = ['id', 'asset', 'occurred', 'verdict', 'basis', 'side', 'segment', 'yield_ratio', 'peak_torque_Nm', 'permanent_twist_rad', 'measured_twist_rad', 'damage', 'report'];
  const columns = Object.fromEntries(names.map((n) => [n, rows.map((r) => guardCell(r[n] ?? null))]));
  return aq.table(columns).toCSV() + '\n';
}
