import { spawnSync } from 'node:child_process';
import { cpSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const SAMPLES = fileURLToPath(new URL('../../sample-cases/', import.meta.url));
const BIN = fileURLToPath(new URL('../cli/bin.js', import.meta.url));
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
 * (user + system) over that of a bare `node -e 0` timed in the same round (three bare runs, as
 * /proc's clock counts in 10 ms): medians over `rounds` rounds.
 */
export function benchCliCosts(rounds = 3): string[] {
  const lines = ['', `CLI cost as CPU time over a bare \`node -e 0\` in the same round (median of ${rounds} rounds):`];
  const ratios = (commands: { args: string[]; cwd?: string }[]) => {
    const r = commands.map(() => [] as number[]);
    const bare: number[] = [];
    for (let i = 0; i < rounds; i++) {
      const b = cpuOf(['-e', '0'], 3);
      bare.push(b);
      commands.forEach((c, k) => r[k].push(cpuOf(c.args, 1, c.cwd) / b));
    }
    return { ratios: r.map(median), bare: median(bare) };
  };
  const help = ratios([{ args: [BIN, '--help'] }]);
  lines.push(`  --help ×${help.ratios[0].toFixed(2)} (bare node ${(help.bare * 1000).toFixed(0)} ms CPU)`);
  lines.push(`  ${'case'.padEnd(36)} ${'check'.padStart(7)} ${'resize'.padStart(7)} ${'report'.padStart(7)}`);
  for (const f of readdirSync(SAMPLES)
    .filter((x) => x.endsWith('.yaml'))
    .sort()) {
    const dir = mkdtempSync(join(tmpdir(), 'shaftcase-bench-'));
    try {
      const file = join(dir, f);
      cpSync(join(SAMPLES, f), file);
      // Each report writes a new dated folder beside the copy of the case.
      const [check, resize, report] = ratios([{ args: [BIN, 'check', '--json', file] }, { args: [BIN, 'resize', file] }, { args: [BIN, 'report', file], cwd: dir }]).ratios;
      lines.push(`  ${f.padEnd(36)} ${`×${check.toFixed(1)}`.padStart(7)} ${`×${resize.toFixed(1)}`.padStart(7)} ${`×${report.toFixed(1)}`.padStart(7)}`);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }
  return lines;
}
