import { createHash } from 'node:crypto';
import { readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { CaseError } from '../case/case-error.ts';
import type { Case } from '../case/case.ts';
import { parseCase } from '../case/parse-case.ts';

/** A case as read from disk: the checked case, the file it came from, its text and SHA-256. */
export interface LoadedCase {
  case: Case;
  /** Path of the case file as given (or `FOLDER/case.yaml`). */
  file: string;
  text: string;
  sha256: string;
}

/** Where the case file of `path` is: the path itself, or `case.yaml` inside a case folder. */
export function caseFilePath(path: string): string {
  try {
    return statSync(path).isDirectory() ? join(path, 'case.yaml') : path;
  } catch {
    return path;
  }
}

/** Reads and checks a case file (or a case folder's `case.yaml`). Throws `CaseError` for the user's mistakes. */
export function loadCase(path: string): LoadedCase {
  const file = caseFilePath(path);
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    const why = (e as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such file' : (e as Error).message;
    throw new CaseError(file, [{ code: 'E_FILE', path: '', message: `cannot read the case file (${why}); give the path of a case .yaml file or a case folder` }]);
  }
  return { case: parseCase(text, file), file, text, sha256: createHash('sha256').update(text).digest('hex') };
}
