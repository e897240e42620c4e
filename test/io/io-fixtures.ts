// Temporary folders for the I/O tests: everything they write goes under the system's temp folder.
import { cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { onTestFinished } from 'vitest';

const made: string[] = [];

/**
 * A new empty folder under os.tmpdir(), removed after the test; made outside a test (in a
 * `beforeAll`), it is removed by `removeTempFolders`, which that file calls in its `afterAll`.
 * (Test files share one module graph per worker, so a hook registered here at load would run for
 * the first file only.)
 */
export function tempFolder(): string {
  const dir = mkdtempSync(join(tmpdir(), 'shaftcase-test-'));
  try {
    onTestFinished(() => rmSync(dir, { recursive: true, force: true }));
  } catch {
    made.push(dir);
  }
  return dir;
}

/** Removes the folders made outside a test. */
export function removeTempFolders(): void {
  for (const d of made.splice(0)) rmSync(d, { recursive: true, force: true });
}

/** A copy of `file` in a new temp folder; returns the copy's path. */
export function copyToTemp(file: string, name = file.split('/').pop()!): string {
  const target = join(tempFolder(), name);
  cpSync(file, target);
  return target;
}
