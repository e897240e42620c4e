import { createHash } from 'node:crypto';
import { crc32, deflateRawSync } from 'node:zlib';
import JSZip from 'jszip';
import CompressedObject from 'jszip/lib/compressedObject.js';
import compressions from 'jszip/lib/compressions.js';

/** A file of the bundle: its path inside the zip (forward slashes) and its bytes. */
export interface BundleFile {
  path: string;
  data: Uint8Array;
}

export function sha256Hex(data: Uint8Array | string): string {
  return createHash('sha256').update(data).digest('hex');
}

/**
 * MANIFEST.txt: one line per file, `SHA-256  path`, sorted by path, in the format `sha256sum -c`
 * checks (two spaces between hash and name).
 */
export function manifest(files: readonly BundleFile[]): string {
  return [...files]
    .sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0))
    .map((f) => `${sha256Hex(f.data)}  ${f.path}`)
    .join('\n')
    .concat('\n');
}

/** Names Windows reserves for devices, whatever the extension. */
const RESERVED = /^(con|prn|aux|nul|com[0-9]|lpt[0-9])(\..*)?$/i;

/**
 * A path from the user (the case file's own name, a photo's path) as a zip entry every extractor
 * keeps inside its folder, on every platform: backslashes are separators, `.` and `..` are
 * resolved (and cannot climb out), characters Windows forbids and control characters become `_`,
 * trailing dots and spaces go, a device name (`CON`, `NUL.txt`) gets a `_` in front.
 */
export function safeEntryPath(path: string): string {
  const parts: string[] = [];
  for (const raw of path.split(/[\\/]+/)) {
    if (raw === '' || raw === '.') continue;
    if (raw === '..') {
      parts.pop();
      continue;
    }
    let part = raw.replace(/[<>:"|?*\u0000-\u001f\u007f-\u009f]/g, '_').replace(/[. ]+$/, '');
    if (part === '') part = '_';
    if (RESERVED.test(part)) part = `_${part}`;
    parts.push(part);
  }
  return parts.length > 0 ? parts.join('/') : '_';
}

/**
 * The files with paths that differ from each other and from MANIFEST.txt even where names are
 * compared without case (Windows, macOS): a later file whose path is taken gets `-2`, `-3`, … before
 * its extension, so no user file can take the manifest's place or another file's.
 */
export function distinctEntries(files: readonly BundleFile[]): BundleFile[] {
  const taken = new Set(['manifest.txt']);
  return files.map((f) => {
    let path = f.path;
    for (let n = 2; taken.has(path.toLowerCase()); n++) path = f.path.replace(/(\.[^./]*)?$/, (ext) => `-${n}${ext}`);
    taken.add(path.toLowerCase());
    return path === f.path ? f : { ...f, path };
  });
}

/**
 * The zip to attach to the ticket: the files as given plus MANIFEST.txt. Every entry carries the
 * same date (the run's), so the same files and date give the same bytes. jszip lays out the
 * archive; each entry is deflated beforehand by node:zlib (level 6, raw deflate as zip's method 8
 * wants) and handed to jszip as already-compressed data, which it writes as it is: zlib's deflate
 * takes a tenth of the time of jszip's own JavaScript one on a report.
 * Paths that collide (without case, or with MANIFEST.txt) are told apart by `distinctEntries`, the
 * earlier file first.
 */
export async function buildBundle(files: readonly BundleFile[], date: Date): Promise<Uint8Array> {
  const zip = new JSZip();
  files = distinctEntries(files);
  const sorted = [...files].sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
  const add = (path: string, data: Uint8Array) => {
    const deflated = deflateRawSync(data, { level: 6 });
    const entry = new CompressedObject(deflated.length, data.length, crc32(data), compressions.DEFLATE, deflated);
    zip.file(path, entry as unknown as Uint8Array, { date, createFolders: false, binary: true, compression: 'DEFLATE' });
  };
  for (const f of sorted) {
    if (f.path.startsWith('/') || f.path.split('/').includes('..')) throw new Error(`bundle path must stay inside the bundle: ${f.path}`);
    add(f.path, f.data);
  }
  add('MANIFEST.txt', new TextEncoder().encode(manifest(files)));
  return zip.generateAsync({ type: 'uint8array', compression: 'DEFLATE' });
}
