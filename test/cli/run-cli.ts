// Runs the CLI in-process with captured output and a fixed clock.
import { runMain } from '../../src/cli/main.ts';
import { FIXED_NOW } from '../report/report-fixtures.ts';

export interface CliRun {
  code: number;
  out: string;
  err: string;
}

export async function cli(args: string[], now: Date = FIXED_NOW): Promise<CliRun> {
  let out = '';
  let err = '';
  const code = await runMain(args, { out: (t) => void (out += t), err: (t) => void (err += t) }, () => now);
  return { code, out, err };
}
