import { readFileSync, realpathSync, statSync } from 'node:fs';
import { dirname, extname, isAbsolute, posix, relative, resolve } from 'node:path';
import { CaseError, type CaseProblem } from '../case/case-error.ts';
import type { Photo } from '../case/case.ts';
import { SIZE_LIMITS } from '../case/limits.ts';
import { positionInText } from '../case/source-position.ts';

/** A photo of the case read from disk. */
export interface PhotoFile {
  photo: Photo;
  /** The path as the case gives it, normalised with forward slashes: where the bundle stores it. */
  path: string;
  data: Uint8Array;
  /** Media type for embedding, or undefined for a file type browsers do not show. */
  mediaType?: string;
}

const MEDIA_TYPES: Record<string, string> = { '.jpg': 'image/jpeg', '.jpeg': 'image/jpeg', '.png': 'image/png', '.gif': 'image/gif', '.webp': 'image/webp' };

/**
 * Reads the case's photos. The parser already refused paths that leave the case folder as written;
 * here the real path (links followed) must also lie inside it, and each photo must exist. Every
 * problem is a CaseError pointing at the photo's line in the case file.
 */
const mb = (bytes: number) => `${Number((bytes / 1e6).toPrecision(3))} MB`;

export function readPhotos(caseFile: string, caseText: string, photos: readonly Photo[]): PhotoFile[] {
  const folder = realpathSync(dirname(caseFile));
  const problems: CaseProblem[] = [];
  const files: PhotoFile[] = [];
  let total = 0;
  photos.forEach((photo, i) => {
    const path = ['observed', 'photos', i, 'path'];
    const fail = (message: string) => problems.push({ code: 'E_FILE', path: `observed.photos[${i}].path`, message, position: positionInText(caseText, path) });
    const given = resolve(dirname(caseFile), photo.path);
    let real: string;
    try {
      real = realpathSync(given);
    } catch {
      fail(`no photo file at "${photo.path}" (looked for ${given}); put the photo in the case folder, such as "photos/keyway.jpg", or correct the path`);
      return;
    }
    const inside = relative(folder, real);
    if (inside === '' || inside.startsWith('..') || isAbsolute(inside)) {
      fail(`"${photo.path}" leads outside the case folder (to ${real}, through a link); copy the photo itself into the case's photos/ folder`);
      return;
    }
    const stat = statSync(real);
    if (!stat.isFile()) {
      fail(`"${photo.path}" is not a file; give the path of a photo such as "photos/keyway.jpg"`);
      return;
    }
    // Sizes are checked before a byte is read: the report carries each photo inside its HTML.
    if (stat.size > SIZE_LIMITS.photoBytes) {
      fail(
        `"${photo.path}" is ${mb(stat.size)}, more than the ${mb(SIZE_LIMITS.photoBytes)} one photo may be; save a smaller copy (about 2000 pixels across is plenty for a report) and give its path`,
      );
      return;
    }
    total += stat.size;
    if (total > SIZE_LIMITS.photosBytes) {
      fail(`with "${photo.path}" the photos come to ${mb(total)}, more than the ${mb(SIZE_LIMITS.photosBytes)} a case's photos may be together; save smaller copies or leave some out`);
      return;
    }
    files.push({ photo, path: posix.normalize(photo.path.replace(/\\/g, '/')), data: readFileSync(real), mediaType: MEDIA_TYPES[extname(real).toLowerCase()] });
  });
  if (problems.length > 0) throw new CaseError(caseFile, problems);
  return files;
}
