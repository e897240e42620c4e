import { loadCase } from '../../io/load-case.ts';
import { analyseCase } from '../../results/analyse-case.ts';
import { resultsToJson } from '../../views/results-json.ts';
import { renderSummary } from '../../views/summary.ts';
import type { Io } from '../main.ts';

export function checkCommand(path: string, opts: { json?: boolean }, io: Io): void {
  const loaded = loadCase(path);
  const results = analyseCase(loaded.case);
  io.out(opts.json ? JSON.stringify(resultsToJson(results), null, 2) + '\n' : renderSummary(results));
}
