import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/**
 * A file shipped with the tool (templates/…), found from this module: src/io/ in development,
 * dist/src/io/ when built.
 */
export function packageFile(rel: string): string {
  for (const up of ['../../', '../../../']) {
    const p = fileURLToPath(new URL(up + rel, import.meta.url));
    if (existsSync(p)) return p;
  }
  throw new Error(`shaftcase is missing its own file ${rel}; reinstall it`);
}
