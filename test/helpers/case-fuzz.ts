// Random mutations of case files for the fuzz tests of the case reader (test/case/fuzz-case.test.ts,
// and at full count test/slow/fuzz-case-*.test.ts): every input is either refused with positioned
// problems or runs with finite numbers, never a stack trace, within a bound of CPU time per input.
// Every input runs in-process (runHostile: the reader, the plausibility screen, the investigation,
// the JSON and the summary); a share of them also through the CLI's own entry (runMain: the file
// read, the exit status, what it prints), a few through the built CLI as a process of its own, and
// a few accepted ones through `report`, whose every written text file is read for NaN and Infinity.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';
import { runMain } from '../../src/cli/main.ts';
import { nonFinite, PROBLEM_LINE, runHostile } from './hostile-run.ts';

const dir = new URL('../../sample-cases/', import.meta.url);
export const SAMPLE_TEXTS = readdirSync(dir)
  .filter((f) => f.endsWith('.yaml'))
  .sort()
  .map((f) => readFileSync(new URL(f, dir), 'utf8'));

/** A small seeded generator (mulberry32), so a failure can be repeated from its seed. */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const HOSTILE_NUMBERS = ['1e308', '1e-308', '0', '-1', '1e400', 'NaN', '1e-300', '99999999', '0.0000001', '-0', '1/0', '3 7/0'];
const HOSTILE_TEXT = ['\u0000', '\u001b[2J', '\u202e', '__proto__', 'constructor', '{{toString}}', '\t', ': ', '- ', '{', '[', '"', '&a', '*a', '!!binary', '? '];

/** One to three random edits of `text`. */
export function mutate(text: string, rnd: () => number): string {
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(rnd() * xs.length)];
  let t = text;
  const edits = 1 + Math.floor(rnd() * 3);
  for (let e = 0; e < edits; e++) {
    const lines = t.split('\n');
    const i = Math.floor(rnd() * lines.length);
    switch (Math.floor(rnd() * 8)) {
      case 0: {
        const numbers = [...t.matchAll(/\d+(\.\d+)?/g)];
        if (numbers.length === 0) break;
        const m = pick(numbers);
        t = t.slice(0, m.index) + pick(HOSTILE_NUMBERS) + t.slice(m.index! + m[0].length);
        break;
      }
      case 1:
        lines.splice(i, 1);
        t = lines.join('\n');
        break;
      case 2:
        lines.splice(i, 0, lines[i]);
        t = lines.join('\n');
        break;
      case 3: {
        // Toggle the case of a letter: "mm" → "Mm", "MPa" → "mPa".
        const at = Math.floor(rnd() * t.length);
        const c = t[at];
        if (c === undefined) break; // an empty text (a cut at its start) has no letter to toggle
        t = t.slice(0, at) + (c === c.toUpperCase() ? c.toLowerCase() : c.toUpperCase()) + t.slice(at + 1);
        break;
      }
      case 4: {
        const at = Math.floor(rnd() * t.length);
        t = t.slice(0, at) + pick(HOSTILE_TEXT) + t.slice(at);
        break;
      }
      case 5:
        t = t.slice(0, Math.floor(rnd() * t.length));
        break;
      case 6: {
        // Swap two lines: keys move between mappings, lists lose their order.
        const j = Math.floor(rnd() * lines.length);
        [lines[i], lines[j]] = [lines[j], lines[i]];
        t = lines.join('\n');
        break;
      }
      default: {
        // Replace a value with another line's value.
        const values = [...t.matchAll(/: ([^\n#]+)/g)];
        if (values.length < 2) break;
        const [a, b] = [pick(values), pick(values)];
        t = t.slice(0, a.index! + 2) + b[1] + t.slice(a.index! + 2 + a[1].length);
      }
    }
  }
  return t;
}

/** The full run (npm run test:slow): 20 000 inputs, in shards of their own seeds, one test file each, so both cores work. */
export const FULL_FUZZ = { inputs: 20_000, shards: 2, seed: 13 } as const;

export interface FuzzOptions {
  count: number;
  seed: number;
  /** The bound on one input's in-process run, ms of this process's CPU time (user and system), which a busy machine does not stretch. */
  perInputCpuMs?: number;
  /** Every n-th input also through the CLI's entry in-process (`check --samples 0` on a file); 0: none. */
  cliEvery?: number;
  /** Every n-th input also through the built CLI as a process (`node dist/cli/bin.js check`); 0: none. */
  processEvery?: number;
  /** Every n-th accepted input also through `report` in-process, its written files read; 0: none. */
  reportEvery?: number;
}

/** What a fuzz run did. */
export interface FuzzTally {
  inputs: number;
  refused: number;
  cli: number;
  processes: number;
  reports: number;
  /** The most CPU time one input's in-process run took, ms. */
  maxCpuMs: number;
  /** Where the time went, ms: CPU in-process (every input), CPU through the CLI's entry and through report, wall time of the processes. */
  spentMs: { inProcess: number; cli: number; reports: number; processes: number };
}

const BIN = fileURLToPath(new URL('../../dist/cli/bin.js', import.meta.url));
const cpuMs = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};
/** A line of a stack trace: what a refusal or a finished run never prints. */
const STACK_LINE = /^\s+at .+[:(]/m;

/** Runs `count` mutated sample cases (seeded); throws at the first input that breaks a rule, naming its seed and number. */
export async function fuzzCases(opts: FuzzOptions): Promise<FuzzTally> {
  const { count, seed, perInputCpuMs = 5000, cliEvery = 0, processEvery = 0, reportEvery = 0 } = opts;
  const rnd = seeded(seed);
  const tally: FuzzTally = { inputs: 0, refused: 0, cli: 0, processes: 0, reports: 0, maxCpuMs: 0, spentMs: { inProcess: 0, cli: 0, reports: 0, processes: 0 } };
  const dir = mkdtempSync(join(tmpdir(), 'shaftcase-fuzz-'));
  // Not case.yaml: a case.yaml is a case folder's, and its asset's history is looked for in the
  // folder above, here the system's temp folder with whatever other programs left there.
  const file = join(dir, 'input.yaml');
  let accepted = 0;
  try {
    for (let done = 0; done < count; done++) {
      const text = mutate(SAMPLE_TEXTS[done % SAMPLE_TEXTS.length], rnd);
      const at = `input ${done} (seed ${seed})`;
      const t0 = cpuMs();
      let out;
      try {
        out = runHostile(text, 0);
      } catch (e) {
        throw new Error(`${at} threw ${(e as Error).stack}\n--- input ---\n${text}`);
      }
      const took = cpuMs() - t0;
      tally.maxCpuMs = Math.max(tally.maxCpuMs, took);
      tally.spentMs.inProcess += took;
      expect(took, `${at} took ${took.toFixed(0)} ms of CPU time:\n${text}`).toBeLessThan(perInputCpuMs);
      if (out.refused) {
        tally.refused++;
        for (const line of out.message.split('\n')) expect(line, at).toMatch(PROBLEM_LINE);
      } else {
        expect(nonFinite(out.json), `${at}:\n${text}`).toEqual([]);
        expect(unexplainedNonFinite(out.summary, text), at).toEqual([]);
      }
      const toCli = cliEvery > 0 && done % cliEvery === 0;
      const toProcess = processEvery > 0 && done % processEvery === 0;
      const toReport = reportEvery > 0 && !out.refused && accepted++ % reportEvery === 0;
      if (!toCli && !toProcess && !toReport) continue;
      writeFileSync(file, text);
      if (toCli) {
        const c0 = cpuMs();
        await expectCliRun(['check', '--samples', '0', file], out.refused, text, `${at}, check through the CLI`);
        tally.cli++;
        tally.spentMs.cli += cpuMs() - c0;
      }
      if (toProcess && existsSync(BIN)) {
        const w0 = performance.now();
        const run = spawnSync(process.execPath, [BIN, 'check', '--samples', '0', file], { encoding: 'utf8', timeout: 120_000, env: { ...process.env, NO_COLOR: '1' } });
        const what = `${at}, check as a process (status ${run.status}, signal ${run.signal}):\n${run.stderr}\n--- input ---\n${text}`;
        expect(run.status, what).toBe(out.refused ? 2 : 0);
        expect(run.stderr, what).not.toMatch(STACK_LINE);
        if (!out.refused) expect(unexplainedNonFinite(run.stdout + run.stderr, text), what).toEqual([]);
        tally.processes++;
        tally.spentMs.processes += performance.now() - w0;
      }
      if (toReport) {
        const r0 = cpuMs();
        await expectCliRun(['report', '--samples', '0', file], false, text, `${at}, report`);
        const reports = join(dir, 'reports');
        for (const f of textFilesUnder(reports)) expect(unexplainedNonFinite(readFileSync(f, 'utf8'), text), `${at}, ${f}:\n${text}`).toEqual([]);
        rmSync(reports, { recursive: true, force: true });
        tally.reports++;
        tally.spentMs.reports += cpuMs() - r0;
      }
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  tally.inputs = count;
  return tally;
}

/**
 * The words of `output` holding "NaN" or "Infinity" that the input's own text does not hold: a
 * mutation puts them in ids, names, descriptions and comments, which the summary shows and the
 * report copies (the case file is in its appendix); a number the tool made is never one of those.
 */
export function unexplainedNonFinite(output: string, input: string): string[] {
  const words = (t: string) => [...t.matchAll(/[^\s"'`<>&;:,()[\]{}|=]*(?:NaN|Infinity)[^\s"'`<>&;:,()[\]{}|=]*/g)].map((m) => m[0]);
  const own = new Set(words(input));
  return words(output).filter((w) => !own.has(w));
}

/**
 * Runs the CLI's entry in-process: exit 2 where the reader refuses the input, else 0; never a
 * throw or a stack; no NaN or Infinity printed where it ran and the input holds none.
 */
async function expectCliRun(args: string[], refused: boolean, input: string, what: string): Promise<void> {
  let out = '';
  let err = '';
  let code;
  try {
    code = await runMain(args, { out: (t) => void (out += t), err: (t) => void (err += t) }, () => new Date('2026-12-01T10:20:30Z'));
  } catch (e) {
    throw new Error(`${what} threw ${(e as Error).stack}\n--- input ---\n${input}`);
  }
  expect(code, `${what}:\n${err}\n--- input ---\n${input}`).toBe(refused ? 2 : 0);
  expect(err, what).not.toMatch(STACK_LINE);
  if (!refused) expect(unexplainedNonFinite(out + err, input), `${what}:\n${input}`).toEqual([]);
}

/** The text files a report wrote (not its zip). */
function textFilesUnder(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir, { recursive: true, encoding: 'utf8' })
    .map((f) => join(dir, f))
    .filter((f) => statSync(f).isFile() && /\.(md|html|json|svg|csv|txt)$/.test(f));
}

/**
 * Shard `shard` (1-based) of the full run: its own seed, an equal share of the inputs; every 5th
 * input also through the CLI's entry, every 250th as a process, every 50th accepted one through
 * `report`. Prints its tally, for the record of the run.
 */
export async function fuzzShard(shard: number): Promise<FuzzTally> {
  const count = FULL_FUZZ.inputs / FULL_FUZZ.shards;
  const seed = FULL_FUZZ.seed + shard - 1;
  const started = performance.now();
  const tally = await fuzzCases({ count, seed, cliEvery: 5, processEvery: 250, reportEvery: 50 });
  const s = ((performance.now() - started) / 1000).toFixed(0);
  console.log(
    `fuzz shard ${shard}/${FULL_FUZZ.shards} (seed ${seed}): ${tally.inputs} inputs, ${tally.refused} refused, ${tally.cli} through the CLI, ${tally.processes} as processes, ${tally.reports} reports; the slowest ${tally.maxCpuMs.toFixed(0)} ms of CPU; ${s} s in all; spent ${JSON.stringify(tally.spentMs, (_k, v) => (typeof v === 'number' ? Math.round(v) : v))}`,
  );
  return tally;
}
