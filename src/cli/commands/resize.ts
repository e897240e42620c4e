import { loadCase } from '../../io/load-case.ts';
import { resizeCase } from '../../resize/resize-case.ts';
import { investigate } from '../../finding/investigate.ts';
import { resizeToJson } from '../../views/resize-json.ts';
import { renderResize } from '../../views/resize-table.ts';
import { screenInputs } from '../input-warnings.ts';
import type { Io } from '../io.ts';
import { terminalProgress } from '../progress.ts';

/**
 * `shaftcase resize CASE [--factor N] [--json]`. Imports no plotting code: it must start fast. The
 * case is investigated as `check` does it (tolerances included), so the present shaft's finding is
 * the same one `check` and the report show.
 */
export function resizeCommand(path: string, opts: { factor?: number; json?: boolean; samples?: number; seed?: number; strict?: boolean }, io: Io): void {
  const loaded = loadCase(path);
  const inputWarnings = screenInputs(loaded, opts.strict, io);
  // The options table shows no observations, so the twist read-back (reruns of the dynamic model) is made for --json only.
  const results = investigate(loaded.case, {
    samples: opts.samples,
    seed: opts.seed,
    onDynamicProgress: terminalProgress('Dynamic model under the tolerances'),
    inputWarnings,
    readBack: opts.json === true,
  });
  const z = resizeCase(loaded.case, results, { factor: opts.factor });
  io.out(opts.json ? JSON.stringify(resizeToJson(z), null, 2) + '\n' : renderResize(z));
}
