import { existsSync, linkSync, mkdirSync, readdirSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { buildBundle, safeEntryPath, type BundleFile } from '../report/bundle.ts';
import { nextReportName, REPORTS_FOLDER } from '../report/layout.ts';
import type { PhotoFile } from './read-photos.ts';
import { reportBaseName } from './report-name.ts';
import { systemFault } from './system-fault.ts';
import { tempNameBeside } from './write-new-file.ts';

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
  /** The case's id: the start of the folder's name, made safe for a file name (`fileSafeId`). */
  caseId: string;
  /** The run's local date, `YYYY-MM-DD`: the end of the folder's name. */
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

/** The zip, complete, inside the folder until the folder is in place: a hidden name no report file takes. */
const PENDING_ZIP = '.bundle.zip.pending';
/** Hidden temporary folders and files of other runs older than this are left over from an interrupted run. */
const STALE_AFTER_MS = 24 * 3600 * 1000;

/**
 * Writes a new report folder `reports/ID-DATE[-N]/` beside the case file (ID the case's id made
 * safe for a file name, `reportBaseName`), and `reports/ID-DATE[-N].zip`
 * with the folder, the case file, its photos and MANIFEST.txt. Nothing is ever overwritten or
 * deleted. The folder is written under a hidden temporary name with the finished zip inside it
 * (under a hidden name); the folder is renamed into place (a rename onto a folder that holds
 * anything fails, so the folder's name is the run's claim), and the zip is then linked beside it
 * and its hidden copy removed. A run killed before the rename leaves only a hidden folder; one
 * killed between the rename and the link leaves a folder whose zip the next run puts in place
 * (`tidyReports`), which also removes hidden temporary folders of interrupted runs. A file-system
 * fault (read-only folder, a file where `reports/` belongs, a full disk) is a `SystemFault`.
 */
export async function writeReport(input: WriteReportInput): Promise<WrittenReport> {
  const reports = join(dirname(input.caseFile), REPORTS_FOLDER);
  const fault = (e: unknown, what: string, path: string) => systemFault(e, what, path) ?? e;
  try {
    mkdirSync(reports, { recursive: true });
    if (!statSync(reports).isDirectory()) throw Object.assign(new Error('not a folder'), { code: 'ENOTDIR' });
  } catch (e) {
    throw fault(e, 'the reports folder', reports);
  }
  tidyReports(reports);
  const base = reportBaseName(input.caseId, input.date);
  const temp = tempNameBeside(join(reports, base));
  try {
    mkdirSync(temp); // not mkdtemp: that makes the folder private (0700), and it becomes the report
  } catch (e) {
    throw fault(e, 'in the reports folder', reports);
  }
  try {
    for (const f of input.files) {
      const path = join(temp, ...f.path.split('/'));
      mkdirSync(dirname(path), { recursive: true });
      writeFileSync(path, f.data);
    }
    for (let attempt = 0; attempt < 100; attempt++) {
      const name = nextReportName(base, new Set(readdirSync(reports)));
      const folder = join(reports, name);
      const zip = join(reports, `${name}.zip`);
      // The report's own files first: where a user's name collides, the user's file is renamed.
      const bundle: BundleFile[] = [
        ...input.files.map((f) => ({ path: `${REPORTS_FOLDER}/${name}/${f.path}`, data: bytes(f.data) })),
        { path: safeEntryPath(basename(input.caseFile)), data: bytes(input.caseText) },
        ...input.photos.map((p) => ({ path: safeEntryPath(p.path), data: p.data })),
      ];
      writeFileSync(join(temp, PENDING_ZIP), await buildBundle(bundle, input.ranAt));
      if (!claim(() => renameSync(temp, folder))) continue;
      // The folder is ours from here; only its zip is left to place.
      if (!claim(() => linkOrMove(join(folder, PENDING_ZIP), zip))) {
        renameSync(folder, temp); // a stray zip of that name, from an older run: take the next name
        continue;
      }
      rmSync(join(folder, PENDING_ZIP), { force: true });
      return { folder, zip };
    }
    throw new Error(`could not find a free report name in ${reports}`);
  } catch (e) {
    throw fault(e, 'the report in', reports);
  } finally {
    rmSync(temp, { recursive: true, force: true }); // only our own temporary folder, when it was not renamed
  }
}

/** Links `from` to `to` (failing with EEXIST when `to` exists); where links are not supported, checks and renames. */
function linkOrMove(from: string, to: string): void {
  try {
    linkSync(from, to);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code !== 'EPERM' && code !== 'ENOTSUP' && code !== 'EOPNOTSUPP' && code !== 'EXDEV') throw e;
    if (existsSync(to)) throw Object.assign(new Error(`${to} exists`), { code: 'EEXIST' });
    renameSync(from, to);
  }
}

/**
 * What interrupted runs left in `reports/`: a report folder still holding its pending zip gets the
 * zip put in place (or, where that name is taken, removed); hidden temporary folders and files
 * (`.NAME.tmp-PID-…`) whose run has ended, or older than a day, are removed. Never touches a
 * visible report or a running run's temporary folder. Best effort: a fault here stops nothing.
 */
export function tidyReports(reports: string): void {
  let names: string[];
  try {
    names = readdirSync(reports);
  } catch {
    return;
  }
  for (const name of names) {
    const path = join(reports, name);
    try {
      const temp = /^\..+\.tmp-(\d+)-[a-z0-9]+$/.exec(name);
      if (temp) {
        const age = Date.now() - statSync(path).mtimeMs;
        if (!isRunning(Number(temp[1])) || age > STALE_AFTER_MS) rmSync(path, { recursive: true, force: true });
        continue;
      }
      const pending = join(path, PENDING_ZIP);
      if (!name.startsWith('.') && existsSync(pending)) {
        if (!existsSync(`${path}.zip`)) linkOrMove(pending, `${path}.zip`);
        rmSync(pending, { force: true });
      }
    } catch {
      // Another run may be tidying the same entry; leave it.
    }
  }
}

/** Whether a process with this id runs (on this machine). */
function isRunning(pid: number): boolean {
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
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
