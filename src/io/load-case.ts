import { createHash } from 'node:crypto';
import { readFileSync, statSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { CaseError } from '../case/case-error.ts';
import type { Case } from '../case/case.ts';
import { parseCase } from '../case/parse-case.ts';
import { SIZE_LIMITS } from '../case/limits.ts';
import { parseSiteCatalogue, type SiteCatalogue } from '../case/site-materials.ts';

/** A case as read from disk: the checked case, the file it came from, its text and SHA-256. */
export interface LoadedCase {
  case: Case;
  /** Path of the case file as given (or `FOLDER/case.yaml`). */
  file: string;
  text: string;
  sha256: string;
  /** The site's materials catalogue the case read, with its path and text (the report bundles it). */
  site?: { path: string; text: string; catalogue: SiteCatalogue };
}

/** The site catalogue's name, looked for in the case's folder and each folder above it. */
export const SITE_CATALOGUE = 'materials.yaml';
/** How many folders up the search goes (far more than any plant's folder tree). */
const SITE_SEARCH_LEVELS = 64;

/** The nearest materials.yaml in the folder of `caseFile` or above it; undefined when there is none. */
export function findSiteCatalogue(caseFile: string): string | undefined {
  let dir = dirname(resolve(caseFile));
  for (let i = 0; i < SITE_SEARCH_LEVELS; i++) {
    const candidate = join(dir, SITE_CATALOGUE);
    try {
      if (statSync(candidate).isFile()) return candidate;
    } catch {
      // not here
    }
    const up = dirname(dir);
    if (up === dir) return undefined;
    dir = up;
  }
  return undefined;
}

/** Reads and checks a site catalogue. Throws `CaseError` (naming the catalogue) for its mistakes. */
export function loadSiteCatalogue(path: string): NonNullable<LoadedCase['site']> {
  let bytes: Buffer;
  try {
    if (statSync(path).size > SIZE_LIMITS.fileBytes)
      throw new CaseError(path, [{ code: 'E_FILE', path: '', message: `the materials catalogue is more than ${SIZE_LIMITS.fileBytes / 1e6} MB; a catalogue needs a few kilobytes` }]);
    bytes = readFileSync(path);
  } catch (e) {
    if (e instanceof CaseError) throw e;
    const code = (e as NodeJS.ErrnoException).code;
    throw new CaseError(path, [
      {
        code: 'E_FILE',
        path: '',
        message: `cannot read the materials catalogue (${code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : (e as Error).message}); give the path of a materials .yaml file`,
      },
    ]);
  }
  const text = decodeUtf8(path, bytes);
  try {
    return { path, text, catalogue: parseSiteCatalogue(text, basename(path), createHash('sha256').update(text).digest('hex')) };
  } catch (e) {
    // The messages name the catalogue by its path, as a case file's name its file.
    if (e instanceof CaseError) throw new CaseError(path, e.problems);
    throw e;
  }
}

/** Where the case file of `path` is: the path itself, or `case.yaml` inside a case folder. */
export function caseFilePath(path: string): string {
  try {
    return statSync(path).isDirectory() ? join(path, 'case.yaml') : path;
  } catch {
    return path;
  }
}

/**
 * Reads and checks a case file (or a case folder's `case.yaml`) with the site's materials
 * catalogue: `materials` names it, else the nearest materials.yaml up the tree is read, if any.
 * Throws `CaseError` for the user's mistakes.
 */
export function loadCase(path: string, opts: { materials?: string } = {}): LoadedCase {
  const file = caseFilePath(path);
  let bytes: Buffer;
  try {
    const size = statSync(file).size;
    if (size > SIZE_LIMITS.fileBytes) {
      throw new CaseError(file, [
        { code: 'E_FILE', path: '', message: `the case file is ${(size / 1e6).toPrecision(3)} MB, more than the ${SIZE_LIMITS.fileBytes / 1e6} MB a case file may be; a case needs a few kilobytes` },
      ]);
    }
    bytes = readFileSync(file);
  } catch (e) {
    if (e instanceof CaseError) throw e;
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder without case.yaml' : code === 'EACCES' ? 'permission denied' : (e as Error).message;
    throw new CaseError(file, [{ code: 'E_FILE', path: '', message: `cannot read the case file (${why}); give the path of a case .yaml file or a case folder` }]);
  }
  const text = decodeUtf8(file, bytes);
  const sitePath = opts.materials ?? findSiteCatalogue(file);
  const site = sitePath === undefined ? undefined : loadSiteCatalogue(sitePath);
  return { case: parseCase(text, file, site?.catalogue), file, text, sha256: createHash('sha256').update(text).digest('hex'), ...(site ? { site } : {}) };
}

/** The file's text; a file that is not UTF-8 is refused at its first bad byte, not read with replacement characters. */
export function decodeUtf8(file: string, bytes: Uint8Array): string {
  try {
    // ignoreBOM keeps a byte-order mark in the text, as it always was (the SHA-256 is of the text).
    return new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(bytes);
  } catch {
    const at = firstBadOffset(bytes);
    const before = new TextDecoder('utf-8').decode(bytes.subarray(0, at));
    const line = before.split('\n').length;
    const column = before.length - before.lastIndexOf('\n');
    throw new CaseError(file, [{ code: 'E_FILE', path: '', message: 'is not UTF-8 text (a byte here is not valid UTF-8); save the file as UTF-8 in your editor', position: { line, column } }]);
  }
}

/** Offset of the first byte that does not begin or continue a valid UTF-8 sequence. */
function firstBadOffset(b: Uint8Array): number {
  let i = 0;
  while (i < b.length) {
    const c = b[i];
    const n = c < 0x80 ? 1 : c >= 0xc2 && c < 0xe0 ? 2 : c >= 0xe0 && c < 0xf0 ? 3 : c >= 0xf0 && c < 0xf5 ? 4 : 0;
    if (n === 0 || i + n > b.length) return i;
    try {
      new TextDecoder('utf-8', { fatal: true }).decode(b.subarray(i, i + n));
    } catch {
      return i;
    }
    i += n;
  }
  return i;
}
