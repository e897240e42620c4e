import { mkdirSync, readdirSync, renameSync, rmSync, unlinkSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { buildBundle, type BundleFile } from '../report/bundle.ts';
import { nextReportName, REPORTS_FOLDER } from '../report/layout.ts';
import type { PhotoFile } from './read-photos.ts';
import { tempNameBeside, writeNewFile } from './write-new-file.ts';

/** A file of the report folder: its path inside the folder (forward slashes) and its content. */
export interface ReportFile {
  path: string;
  data: string | Uint8Array;
}

export interface WriteReportInput {
  /** The case file, copied into the zip beside the report. */
  caseFile: string;
  caseText: string;
  photos: readonly PhotoFile[];
  files: readonly ReportFile[];
  /** The run's local date, `YYYY-MM-DD`: the folder's name. */
  date: string;
  /** The run's moment, stamped on every zip entry. */
  ranAt: Date;
}

export interface WrittenReport {
  /** The new report folder. */
  folder: string;
  /** The zip beside it. */
  zip: string;
}

const bytes = (d: string | Uint8Array) => (typeof d === 'string' ? new TextEncoder().encode(d) : d);

/**
 * Writes a new report folder `reports/DATE[-N]/` beside the case file, and `reports/DATE[-N].zip`
 * with the folder, the case file, its photos and MANIFEST.txt. Nothing is ever overwritten or
 * deleted: the folder is written under a temporary name and renamed into place (a rename onto a
 * folder that holds anything fails), the zip is written whole under a temporary name and linked to
 * a name that must be free. An interrupted run leaves at most a hidden temporary folder.
 */
export async function writeReport(input: WriteReportInput): Promise<WrittenReport> {
  const reports = join(dirname(input.caseFile), REPORTS_FOLDER);
  mkdirSync(reports, { recursive: true });
  const temp = tempNameBeside(join(reports, input.date));
  mkdirSync(temp); // not mkdtemp: that makes the folder private (0700), and it becomes the report
  try {
    for (const f of input.files) {
      const path = join(temp, ...f.path.split('/'));
      mkdirSync(dirname(path), { recursive: true });
      writeFileSync(path, f.data);
    }
    for (let attempt = 0; attempt < 100; attempt++) {
      const name = nextReportName(input.date, new Set(readdirSync(reports)));
      const folder = join(reports, name);
      const zip = join(reports, `${name}.zip`);
      const bundle: BundleFile[] = [
        { path: basename(input.caseFile), data: bytes(input.caseText) },
        ...input.photos.map((p) => ({ path: p.path, data: p.data })),
        ...input.files.map((f) => ({ path: `${REPORTS_FOLDER}/${name}/${f.path}`, data: bytes(f.data) })),
      ];
      const data = await buildBundle(bundle, input.ranAt);
      if (!claim(() => writeNewFile(zip, data))) continue;
      if (!claim(() => renameSync(temp, folder))) {
        unlinkSync(zip); // ours, just written: the name was taken by another run meanwhile
        continue;
      }
      return { folder, zip };
    }
    throw new Error(`could not find a free report name in ${reports}`);
  } finally {
    rmSync(temp, { recursive: true, force: true }); // only our own temporary folder, when it was not renamed
  }
}

/** Runs a write that fails when its target exists; false when it did. */
function claim(write: () => void): boolean {
  try {
    write();
    return true;
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'EEXIST' || code === 'ENOTEMPTY') return false;
    throw e;
  }
}
