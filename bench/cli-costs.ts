import { spawnSync } from 'node:child_process';
import { cpSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const SAMPLES = fileURLToPath(new URL('../../sample-cases/', import.meta.url));
const BIN = fileURLToPath(new URL('../src/cli/bin.js', import.meta.url));
/** Clock ticks per second of /proc/self/stat's times (USER_HZ, 100 on Linux). */
const TICKS = 100;

/** CPU seconds (user + system) of this process's children that have ended, from /proc/self/stat. */
function childrenCpu(): number {
  const stat = readFileSync('/proc/self/stat', 'utf8');
  const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
  // Fields 16 and 17 of stat (cutime, cstime), counted from 1 with pid and comm first.
  return (Number(fields[13]) + Number(fields[14])) / TICKS;
}

/** CPU seconds of `reps` runs of node with `args`, per run. */
function cpuOf(args: string[], reps: number, cwd?: string): number {
  const before = childrenCpu();
  for (let i = 0; i < reps; i++) {
    const r = spawnSync(process.execPath, args, { cwd, stdio: ['ignore', 'ignore', 'pipe'], env: { ...process.env, SOURCE_DATE_EPOCH: '1780000000' } });
    if (r.status !== 0) throw new Error(`node ${args.join(' ')} exited ${r.status}: ${r.stderr}`);
  }
  return (childrenCpu() - before) / reps;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/**
 * `check`, `resize` and `report` of every sample case through the built CLI, each as its CPU time
 * (user + system) over that of a bare `node -e 0` timed just before it: medians of `rounds` rounds
 * of paired runs (each side two runs long, as /proc's clock counts in 10 ms).
 */
export function benchCliCosts(rounds = 3): string[] {
  const lines = ['', `CLI cost as CPU time over a bare \`node -e 0\` in the same round (median of ${rounds} rounds):`];
  const ratio = (args: string[], cwd?: string) => {
    const r: number[] = [];
    const bare: number[] = [];
    for (let i = 0; i < rounds; i++) {
      const b = cpuOf(['-e', '0'], 2);
      bare.push(b);
      r.push(cpuOf(args, 2, cwd) / b);
    }
    return { ratio: median(r), bare: median(bare) };
  };
  const help = ratio([BIN, '--help']);
  lines.push(`  --help ×${help.ratio.toFixed(2)} (bare node ${(help.bare * 1000).toFixed(0)} ms)`);
  lines.push(`  ${'case'.padEnd(36)} ${'check'.padStart(7)} ${'resize'.padStart(7)} ${'report'.padStart(7)}`);
  for (const f of readdirSync(SAMPLES).filter((x) => x.endsWith('.yaml')).sort()) {
    const dir = mkdtempSync(join(tmpdir(), 'shaftcase-bench-'));
    try {
      const file = join(dir, f);
      cpSync(join(SAMPLES, f), file);
      const check = ratio([BIN, 'check', '--json', file]);
      const resize = ratio([BIN, 'resize', file]);
      // Each report writes a new dated folder beside the copy of the case.
      const report = ratio([BIN, 'report', file], dir);
      lines.push(`  ${f.padEnd(36)} ${`×${check.ratio.toFixed(1)}`.padStart(7)} ${`×${resize.ratio.toFixed(1)}`.padStart(7)} ${`×${report.ratio.toFixed(1)}`.padStart(7)}`);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }
  return lines;
}
