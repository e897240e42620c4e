// The built CLI's `report`, killed (SIGKILL) between two of its writes or after a time, for the
// tests of an interrupted report (test/cli/report-killed.test.ts, and every step in
// test/slow/report-killed.test.ts): what a kill leaves in reports/, and what the next run makes of it.
import { spawn } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { basename, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import JSZip from 'jszip';
import { expect } from 'vitest';

export const BIN = fileURLToPath(new URL('../../dist/cli/bin.js', import.meta.url));
const PRELOAD = new URL('./kill-at-fs-step.mjs', import.meta.url).href;
/** The zip's hidden name inside a report folder until it is linked beside the folder (src/io/write-report.ts). */
export const PENDING_ZIP = '.bundle.zip.pending';

export interface ReportRun {
  status: number | null;
  signal: NodeJS.Signals | null;
  stderr: string;
}

/**
 * Runs `shaftcase report caseFile` as a user would (a process of its own, the date fixed by
 * SOURCE_DATE_EPOCH). `killAfter` (see kill-at-fs-step.mjs) kills it right after that write;
 * `killAfterMs` kills it after that long; `fsLog` records its writes.
 */
export function runReport(caseFile: string, opts: { killAfter?: string; killAfterMs?: number; fsLog?: string } = {}): Promise<ReportRun> {
  const env: NodeJS.ProcessEnv = { ...process.env, SOURCE_DATE_EPOCH: '1780000000', TZ: 'UTC' };
  if (opts.killAfter !== undefined) env.SHAFTCASE_TEST_KILL_AFTER = opts.killAfter;
  if (opts.fsLog !== undefined) env.SHAFTCASE_TEST_FS_LOG = opts.fsLog;
  const child = spawn(process.execPath, ['--import', PRELOAD, BIN, 'report', caseFile], { env, stdio: ['ignore', 'ignore', 'pipe'] });
  let stderr = '';
  child.stderr.on('data', (d) => (stderr += d));
  const timer = opts.killAfterMs === undefined ? undefined : setTimeout(() => child.kill('SIGKILL'), opts.killAfterMs);
  return new Promise((resolve, reject) => {
    child.on('error', reject);
    child.on('close', (status, signal) => {
      clearTimeout(timer);
      resolve({ status, signal, stderr });
    });
  });
}

/** Every file under `dir`, relative, with forward slashes, sorted. */
export function filesUnder(dir: string): string[] {
  const out: string[] = [];
  const walk = (d: string) => {
    for (const name of readdirSync(d)) {
      const p = join(d, name);
      if (statSync(p).isDirectory()) walk(p);
      else out.push(relative(dir, p).split('\\').join('/'));
    }
  };
  walk(dir);
  return out.sort();
}

/** The visible names in reports/ (a name starting with a dot is hidden). */
export const visible = (reports: string) => (existsSync(reports) ? readdirSync(reports).filter((n) => !n.startsWith('.')) : []).sort();
export const hidden = (reports: string) => (existsSync(reports) ? readdirSync(reports).filter((n) => n.startsWith('.')) : []).sort();

/**
 * Asserts `folder` is a complete report and `zip` its whole bundle: the zip opens and holds the
 * case file, the manifest and the folder's files, and the folder holds exactly the zip's (its hidden
 * pending zip aside), which are `files` where given, else at least the report and its results.
 */
export async function expectCompleteReport(folder: string, zip: Uint8Array, caseName: string, files?: readonly string[]): Promise<void> {
  const name = basename(folder);
  const entries = Object.values((await JSZip.loadAsync(zip)).files)
    .filter((f) => !f.dir)
    .map((f) => f.name)
    .sort();
  const inFolder = entries.filter((e) => e.startsWith(`reports/${name}/`)).map((e) => e.slice(`reports/${name}/`.length));
  expect(entries).toEqual([...inFolder.map((f) => `reports/${name}/${f}`), 'MANIFEST.txt', caseName].sort());
  expect(filesUnder(folder).filter((f) => f !== PENDING_ZIP)).toEqual(inFolder);
  if (files) expect(inFolder).toEqual(files);
  else expect(inFolder).toEqual(expect.arrayContaining(['report.html', 'report.md', 'results.json']));
}

export type KilledState = 'nothing' | 'complete' | 'zip not yet beside';

/**
 * What a killed run may leave visible in `reports`, beside the names `before` there were: nothing
 * new; or a complete folder with its whole zip beside it; or, killed in the moment between the
 * folder's rename into place and the zip's link beside it, the complete folder still holding its
 * whole zip under the hidden name, which the next run puts in place. Never a zip without its
 * folder, a folder missing a file, or a zip that does not open. Returns the state it found.
 */
export async function expectNothingHalfWritten(reports: string, before: readonly string[], caseName: string, files?: readonly string[]): Promise<KilledState> {
  const added = visible(reports).filter((n) => !before.includes(n));
  if (added.length === 0) return 'nothing';
  const folder = added.find((n) => !n.endsWith('.zip'));
  expect(folder, `a zip without its folder: ${added.join(', ')}`).toBeDefined();
  const path = join(reports, folder!);
  if (added.length === 2) {
    expect(added).toEqual([folder, `${folder}.zip`]);
    await expectCompleteReport(path, readFileSync(`${path}.zip`), caseName, files);
    return 'complete';
  }
  expect(added).toEqual([folder]);
  await expectCompleteReport(path, readFileSync(join(path, PENDING_ZIP)), caseName, files);
  return 'zip not yet beside';
}

/** After a whole run: no hidden entry left in reports/, no pending zip in a folder, every folder complete with its zip. */
export async function expectTidy(reports: string, caseName: string, files?: readonly string[]): Promise<void> {
  expect(hidden(reports)).toEqual([]);
  const names = visible(reports);
  const folders = names.filter((n) => !n.endsWith('.zip'));
  expect(names).toEqual([...folders, ...folders.map((f) => `${f}.zip`)].sort());
  for (const f of folders) {
    expect(existsSync(join(reports, f, PENDING_ZIP)), `${f} still holds its pending zip`).toBe(false);
    await expectCompleteReport(join(reports, f), readFileSync(join(reports, `${f}.zip`)), caseName, files);
  }
}
