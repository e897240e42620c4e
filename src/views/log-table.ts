import type { IncidentLog } from '../log/build-log.ts';
import { show, sig } from './display-units.ts';
import { textTable } from './text-table.ts';

/** The share of life as the log shows it: "12 %", two significant figures below a percent ("0.33 %"), "less than 0.01 %" below that. */
export function damagePercent(d: number): string {
  if (d > 0 && d < 1e-4) return 'less than 0.01 %';
  if (d > 0 && d < 0.01) return `${sig(d * 100, 2)} %`;
  return `${Math.round(d * 100)} %`;
}

/**
 * The log for the terminal: the incidents, the rollups per asset with their finding, and the
 * cautions of a fatigue estimate. Numbers from the log, rounded for the eye.
 */
export function renderLog(log: IncidentLog, notes: readonly string[] = []): string {
  const out: string[] = [];
  if (log.incidents.length === 0) return 'No cases found.\n';
  out.push(`Incidents (${log.incidents.length})`, '');
  const head = ['asset', 'id', 'occurred', 'verdict', 'segment', 'stress / shear yield', 'peak torque', 'damage', 'from'];
  const rows = log.incidents.map((r) => [
    r.asset ?? '—',
    r.id,
    r.occurred ?? '—',
    r.verdict,
    r.segment,
    sig(r.yield_ratio),
    show(r.peak_torque_Nm, 'torque', 'metric'),
    damagePercent(r.damage),
    r.report ? 'report' : 'engine',
  ]);
  out.push(...textTable([head, ...rows]), '');
  if (log.assets.length > 0) {
    out.push('Assets', '');
    const aHead = ['asset', 'incidents', 'worst stress / shear yield', 'mean interval', 'life used (Miner sum)'];
    const aRows = log.assets.map((a) => [
      a.asset,
      String(a.incidents),
      sig(a.worst_yield_ratio),
      a.mean_interval_days === null ? '—' : `${sig(a.mean_interval_days, 3)} days`,
      damagePercent(a.damage),
    ]);
    out.push(...textTable([aHead, ...aRows]), '');
    for (const a of log.assets) out.push(`${a.finding.sentence}`);
    out.push('');
  }
  out.push(...LOG_CAUTIONS.map((c) => `Caution: ${c}`));
  if (notes.length > 0) out.push('', ...notes);
  return out.join('\n') + '\n';
}

/** The cautions of every fatigue estimate the log shows. */
export const LOG_CAUTIONS = [
  'fatigue estimates scatter by a factor of several in life (more where the constants are estimated from the tensile strength); the damage is an estimate, not a measurement.',
  'a crack test (magnetic particle or dye penetrant at the keyseat and fillets) decides; a shaft near its estimated life is inspected before it goes back in.',
  "lock out and tag out before any inspection; codes, the builder's instructions and a licensed engineer govern a return to service.",
] as const;
