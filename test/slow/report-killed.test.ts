import { cpSync, existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { BIN, expectNothingHalfWritten, expectTidy, filesUnder, runReport, visible, type KilledState } from '../helpers/killed-report.ts';

// A real `report` process killed (SIGKILL) right after each of its steps in reports/ (its folders,
// the zip, the rename, the link, the removals, and files written in the hidden folder:
// test/helpers/kill-at-fs-step.mjs counts them), and after times spread over a whole run; after each kill, what is visible is nothing or complete,
// and the next whole run leaves no hidden folder and every folder with its zip.
const ONE_DISC = fileURLToPath(new URL('../data/one-disc.yaml', import.meta.url));
const made: string[] = [];
afterAll(() => made.forEach((d) => rmSync(d, { recursive: true, force: true })));

function caseCopy(): string {
  const dir = mkdtempSync(join(tmpdir(), 'shaftcase-killed-'));
  made.push(dir);
  const file = join(dir, 'one-disc.yaml');
  cpSync(ONE_DISC, file);
  return file;
}

/** Runs `jobs` two at a time (the machine's two cores). */
async function twoAtATime<T>(jobs: (() => Promise<T>)[]): Promise<T[]> {
  const out: T[] = [];
  let next = 0;
  const worker = async () => {
    while (next < jobs.length) {
      const i = next++;
      out[i] = await jobs[i]();
    }
  };
  await Promise.all([worker(), worker()]);
  return out;
}

/** A kill, the check of what it left, then a whole run and the check that it tidied. */
async function killThenRunAgain(kill: { killAfter?: string; killAfterMs?: number }, files: readonly string[]): Promise<KilledState> {
  const file = caseCopy();
  const reports = join(dirname(file), 'reports');
  await runReport(file, kill);
  const state = await expectNothingHalfWritten(reports, [], 'one-disc.yaml', files);
  const again = await runReport(file);
  expect(again.stderr).toBe('');
  expect(again.status).toBe(0);
  expect(visible(reports).length).toBe(state === 'nothing' ? 2 : 4);
  await expectTidy(reports, 'one-disc.yaml', files);
  return state;
}

describe.skipIf(!existsSync(BIN))('shaftcase report killed at every step of its writing', () => {
  it('leaves nothing visible or a complete folder with its zip, and the next run cleans up after it', async () => {
    const reference = caseCopy();
    const log = join(dirname(reference), 'fs.log');
    const started = performance.now();
    const whole = await runReport(reference, { fsLog: log });
    const wholeMs = performance.now() - started;
    expect(whole.status).toBe(0);
    const folder = join(dirname(reference), 'reports', 'T-1-2026-05-28');
    const files = filesUnder(folder);
    // A kill after each step that changes what reports/ holds (the folder, the hidden folder, the
    // rename, the link, the removals), and after the first, a middle and the last file written
    // inside the hidden folder (the other writes there leave the same state); a recursive mkdir of
    // a folder made before is no new state.
    const seen = new Set<string>();
    const all: { n: string; name: string; inside: boolean }[] = [];
    for (const line of readFileSync(log, 'utf8').trim().split('\n')) {
      const [n, name, path] = line.split(' ');
      const what = `${name} ${path.replace(/\.tmp-\d+-[a-z0-9]+/, '.tmp')}`;
      if (!seen.has(what)) all.push({ n, name, inside: /\.tmp-[^/]+\/./.test(path) && !path.endsWith('.bundle.zip.pending') });
      seen.add(what);
    }
    const inside = all.filter((s) => s.inside);
    expect(inside.length).toBeGreaterThanOrEqual(files.length); // every file of the report
    const picked = new Set([inside[0], inside[Math.floor(inside.length / 2)], inside[inside.length - 1]]);
    const steps = all.filter((s) => !s.inside || picked.has(s));
    expect(steps.map((s) => s.name)).toEqual(expect.arrayContaining(['renameSync', 'linkSync']));
    const atSteps = await twoAtATime(
      steps.map(
        ({ n }) =>
          () =>
            killThenRunAgain({ killAfter: n }, files),
      ),
    );
    // Before the rename nothing is visible; after it the folder, then the folder with its zip.
    const renamed = steps.findIndex((s) => s.name === 'renameSync');
    expect(atSteps.slice(0, renamed)).toEqual(Array(renamed).fill('nothing'));
    expect(atSteps[renamed]).toBe('zip not yet beside');
    expect(atSteps.slice(renamed + 1)).toEqual(Array(steps.length - renamed - 1).fill('complete'));

    // Kills after a time, spread over a whole run's length (they mostly land in the computing; the
    // last ones may find the run done): whatever the moment, the same holds.
    const delays = [0.2, 0.5, 0.8, 0.95, 1].map((f) => Math.round(f * wholeMs));
    await twoAtATime(delays.map((ms) => () => killThenRunAgain({ killAfterMs: ms }, files)));
  }, 600_000);
});
