import { loadCase } from '../../io/load-case.ts';
import { investigate } from '../../finding/investigate.ts';
import { resultsToJson } from '../../views/results-json.ts';
import { screenInputs } from '../input-warnings.ts';
import type { Io } from '../io.ts';
import { terminalProgress } from '../progress.ts';

export async function checkCommand(path: string, opts: { json?: boolean; samples?: number; seed?: number; strict?: boolean; materials?: string }, io: Io): Promise<void> {
  const loaded = loadCase(path, { materials: opts.materials });
  const inputWarnings = screenInputs(loaded, opts.strict, io);
  const investigation = investigate(loaded.case, { samples: opts.samples, seed: opts.seed, onDynamicProgress: terminalProgress('Dynamic model under the tolerances'), inputWarnings });
  // A case of an asset: its place in the history, from the cases around it (the log's modules load only then).
  const results = loaded.case.meta.asset === undefined ? investigation : (await import('../asset-history.ts')).withAssetHistory(loaded, investigation);
  // The terminal summary's views load only when it is printed.
  io.out(opts.json ? JSON.stringify(resultsToJson(results), null, 2) + '\n' : (await import('../../views/summary.ts')).renderSummary(results));
}
