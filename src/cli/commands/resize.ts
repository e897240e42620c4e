import { loadCase } from '../../io/load-case.ts';
import { resizeCase } from '../../resize/resize-case.ts';
import { analyseCase } from '../../results/analyse-case.ts';
import { withInputWarnings } from '../../results/input-warnings.ts';
import { resizeToJson } from '../../views/resize-json.ts';
import { renderResize } from '../../views/resize-table.ts';
import { screenInputs } from '../input-warnings.ts';
import type { Io } from '../main.ts';

/** `shaftcase resize CASE [--factor N] [--json]`. Imports no plotting code: it must start fast. */
export function resizeCommand(path: string, opts: { factor?: number; json?: boolean; strict?: boolean }, io: Io): void {
  const loaded = loadCase(path);
  const inputWarnings = screenInputs(loaded, opts.strict, io);
  const results = withInputWarnings(analyseCase(loaded.case), inputWarnings);
  const z = resizeCase(loaded.case, results, { factor: opts.factor });
  io.out(opts.json ? JSON.stringify(resizeToJson(z), null, 2) + '\n' : renderResize(z));
}
