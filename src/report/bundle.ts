import { createHash } from 'node:crypto';
import JSZip from 'jszip';

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

/**
 * The zip to attach to the ticket: the files as given plus MANIFEST.txt. Every entry carries the
 * same date (the run's), so the same files and date give the same bytes.
 */
export async function buildBundle(files: readonly BundleFile[], date: Date): Promise<Uint8Array> {
  const zip = new JSZip();
  const sorted = [...files].sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
  for (const f of sorted) {
    if (f.path.startsWith('/') || f.path.split('/').includes('..')) throw new Error(`bundle path must stay inside the bundle: ${f.path}`);
    zip.file(f.path, f.data, { date, createFolders: false });
  }
  zip.file('MANIFEST.txt', manifest(files), { date, createFolders: false });
  return zip.generateAsync({ type: 'uint8array', compression: 'DEFLATE', compressionOptions: { level: 6 } });
}
