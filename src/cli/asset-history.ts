import { basename, dirname, resolve } from 'node:path';
import type { Investigation } from '../finding/investigation.ts';
import type { LoadedCase } from '../io/load-case.ts';
import { assetHistory } from '../log/asset-history.ts';
import { buildLog } from '../log/build-log.ts';
import { collectIncidents } from './collect-incidents.ts';

/**
 * Where the log looks for a case's fellow incidents: beside a loose case file its own folder; for
 * a case folder (`…/INC-1/case.yaml`) the folder that holds the case folders.
 */
export function historyFolder(caseFile: string): string {
  return basename(caseFile) === 'case.yaml' ? dirname(dirname(caseFile)) : dirname(caseFile);
}

/**
 * The investigation with its place in its asset's history where the case has `case.asset`: the
 * log of the cases around it, this case's row from this run. Unchanged without an asset.
 */
export function withAssetHistory(loaded: LoadedCase, results: Investigation): Investigation {
  if (loaded.case.meta.asset === undefined) return results;
  const folder = historyFolder(loaded.file);
  const { rows } = collectIncidents(folder, new Map([[resolve(loaded.file), { loaded, results }]]));
  const history = assetHistory(buildLog(rows), resolve(loaded.file), folder);
  return history ? { ...results, assetHistory: history } : results;
}
