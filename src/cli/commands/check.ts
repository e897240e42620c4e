import { loadCase } from '../../io/load-case.ts';
import { investigate } from '../../results/investigate.ts';
import { resultsToJson } from '../../views/results-json.ts';
import type { Io } from '../main.ts';
import { terminalProgress } from '../progress.ts';

export async function checkCommand(path: string, opts: { json?: boolean; samples?: number; seed?: number }, io: Io): Promise<void> {
  const loaded = loadCase(path);
  const results = investigate(loaded.case, { samples: opts.samples, seed: opts.seed, onDynamicProgress: terminalProgress('Dynamic model under the tolerances') });
  // The terminal summary's views load only when it is printed.
  io.out(opts.json ? JSON.stringify(resultsToJson(results), null, 2) + '\n' : (await import('../../views/summary.ts')).renderSummary(results));
}
