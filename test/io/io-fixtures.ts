// Temporary folders for the I/O tests: everything they write goes under the system's temp folder.
import { cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach } from 'vitest';

const made: string[] = [];

/** A new empty folder under os.tmpdir(), removed after the test. */
export function tempFolder(): string {
  const dir = mkdtempSync(join(tmpdir(), 'shaftcase-test-'));
  made.push(dir);
  return dir;
}

/** A copy of `file` in a new temp folder; returns the copy's path. */
export function copyToTemp(file: string, name = file.split('/').pop()!): string {
  const target = join(tempFolder(), name);
  cpSync(file, target);
  return target;
}

afterEach(() => {
  for (const d of made.splice(0)) rmSync(d, { recursive: true, force: true });
});
