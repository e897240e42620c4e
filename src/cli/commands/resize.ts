import { loadCase } from '../../io/load-case.ts';
import { resizeCase } from '../../resize/resize-case.ts';
import { analyseCase } from '../../results/analyse-case.ts';
import { resizeToJson } from '../../views/resize-json.ts';
import { renderResize } from '../../views/resize-table.ts';
import type { Io } from '../main.ts';

/** `shaftcase resize CASE [--factor N] [--json]`. Imports no plotting code: it must start fast. */
export function resizeCommand(path: string, opts: { factor?: number; json?: boolean }, io: Io): void {
  const loaded = loadCase(path);
  // The options table shows no observations, so the twist read-back (reruns of the dynamic model) is made for --json only.
  const results = analyseCase(loaded.case, { readBack: opts.json === true });
  const z = resizeCase(loaded.case, results, { factor: opts.factor });
  io.out(opts.json ? JSON.stringify(resizeToJson(z), null, 2) + '\n' : renderResize(z));
}
