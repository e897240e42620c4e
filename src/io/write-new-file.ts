import { linkSync, renameSync, unlinkSync, writeFileSync, existsSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';

/** A temporary name in the same folder as `path`, so a rename or link never crosses file systems. */
export function tempNameBeside(path: string): string {
  return join(dirname(path), `.${basename(path)}.tmp-${process.pid}-${Math.random().toString(36).slice(2, 10)}`);
}

/**
 * Writes a file that must not exist yet, all or nothing: the data goes to a temporary name in the
 * same folder, which is then hard-linked to the final name (the link fails if the name is taken,
 * so nothing is ever overwritten) and removed. Where hard links are not supported, an existence
 * check and a rename stand in. Throws an error with code EEXIST when the file exists.
 */
export function writeNewFile(path: string, data: string | Uint8Array): void {
  const temp = tempNameBeside(path);
  writeFileSync(temp, data, { flag: 'wx' });
  try {
    try {
      linkSync(temp, path);
    } catch (e) {
      const code = (e as NodeJS.ErrnoException).code;
      if (code !== 'EPERM' && code !== 'ENOTSUP' && code !== 'EOPNOTSUPP' && code !== 'EXDEV') throw e;
      if (existsSync(path)) throw Object.assign(new Error(`${path} exists`), { code: 'EEXIST' });
      renameSync(temp, path);
    }
  } finally {
    if (existsSync(temp)) unlinkSync(temp);
  }
}
