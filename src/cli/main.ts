import { Command, CommanderError, InvalidArgumentError, Option } from 'commander';
import { CaseError } from '../case/case-error.ts';
import { NUMBER_LIMITS } from '../case/limits.ts';
import { sourceDateEpoch, SystemFault, UsageError } from './run-errors.ts';
import { version } from './version.ts';
import type { Io } from './io.ts';

export type { Io } from './io.ts';

/** Parses a whole-number option; commander reports the error and exits 2. */
function wholeNumber(value: string): number {
  if (!/^\d+$/.test(value)) throw new InvalidArgumentError(`"${value}" is not a whole number; give one such as 10000`);
  return Number(value);
}

/** Parses `--samples`: a whole number within the case format's limit (analysis.samples). */
function sampleCount(value: string): number {
  const n = wholeNumber(value);
  if (n > NUMBER_LIMITS.samples[1]) throw new InvalidArgumentError(`${value} is more than ${NUMBER_LIMITS.samples[1]} samples; give one such as 10000`);
  return n;
}

const stdio: Io = { out: (t) => process.stdout.write(t), err: (t) => process.stderr.write(t) };

/** Parses `--factor`: a plain number of 1 or more. */
function designFactor(text: string): number {
  const n = Number(text);
  if (!Number.isFinite(n) || n < 1) throw new InvalidArgumentError(`give a design factor of 1 or more, such as 1.5 (not "${text}")`);
  return n;
}

/**
 * The clock of a run: now, or the moment SOURCE_DATE_EPOCH gives (seconds since 1970, the
 * reproducible-builds convention) so a run can be repeated with the same date. A malformed or
 * out-of-range value is a `UsageError` (exit 2).
 */
export function systemClock(): Date {
  return sourceDateEpoch(process.env.SOURCE_DATE_EPOCH) ?? new Date();
}

/**
 * The one place that prints and decides the exit status: 0 done, 2 the user's mistake (a bad case
 * file or bad arguments), 1 a bug, shown with its stack so it can be reported.
 */
export async function runMain(argv: string[], io: Io = stdio, clock: () => Date = systemClock): Promise<number> {
  const program = new Command('shaftcase')
    .description('Investigate a sudden stop of a rotating machine: impact torque, stress and twist from a case file.')
    .version(version())
    .exitOverride()
    .configureOutput({ writeOut: io.out, writeErr: io.err });

  program
    .command('check')
    .description('check a case file and print the impact torque, stress, twist and verdict')
    .argument('<case>', 'a case .yaml file or a case folder')
    .option('--json', 'print one JSON object, SI units')
    .option('--samples <n>', 'Monte Carlo samples for a case with tolerances (0: none)', sampleCount)
    .option('--seed <s>', 'seed of the Monte Carlo (recorded with the results)', wholeNumber)
    .option('--materials <file>', "the site's materials catalogue (default: the nearest materials.yaml in the case's folder or above)")
    .option('--strict', 'treat the plausibility warnings (values almost certainly mistyped) as errors: exit 2')
    .action(
      async (file: string, opts: { json?: boolean; samples?: number; seed?: number; strict?: boolean; materials?: string }) => await (await import('./commands/check.ts')).checkCommand(file, opts, io),
    );

  program
    .command('resize')
    .description('what goes back in: replacement sizes, another material, a torque limiter, the key as fuse')
    .argument('<case>', 'a case .yaml file or a case folder')
    .option('--factor <N>', "design factor on shear yield in a repeat of the incident (default: the case's, else 1.5)", designFactor)
    .option('--json', 'print the check --json object with resize added, SI units')
    .option('--samples <n>', 'Monte Carlo samples for a case with tolerances (0: none), as for check', sampleCount)
    .option('--seed <s>', 'seed of the Monte Carlo, as for check', wholeNumber)
    .option('--strict', 'treat the plausibility warnings (values almost certainly mistyped) as errors: exit 2')
    .action(async (file: string, opts: { factor?: number; json?: boolean; samples?: number; seed?: number; strict?: boolean }) => (await import('./commands/resize.ts')).resizeCommand(file, opts, io));

  program
    .command('materials')
    .description('list the built-in materials and their sources')
    .option('--json', 'print the list as JSON, SI units')
    .option('--yaml', "print the list in the case file's form (materials:), to start a case's or a site's own from")
    .action(async (opts: { json?: boolean; yaml?: boolean }) => (await import('./commands/materials.ts')).materialsCommand(opts, io));

  program
    .command('new')
    .description('create a case folder from the templates: case.yaml with comments on what to measure, photos/, README.md')
    .argument('<folder>', 'the new case folder')
    .addOption(new Option('--units <units>', 'units of the case template').choices(['metric', 'us']).default('metric'))
    .action(async (folder: string, opts: { units: 'metric' | 'us' }) => (await import('./commands/new.ts')).newCommand(folder, opts, io));

  program
    .command('report')
    .description('write a dated report folder (Markdown, HTML, figures, tables, results.json) and a zip for the ticket beside the case')
    .argument('<case>', 'a case .yaml file or a case folder')
    .option('--template <file>', "a site's own report template (Markdown with {{…}} placeholders, see templates/report.md)")
    .option('--pdf', 'also print report.pdf with Chromium (Debian package chromium)')
    .option('--samples <n>', 'Monte Carlo samples for a case with tolerances (0: none)', sampleCount)
    .option('--seed <s>', 'seed of the Monte Carlo (recorded with the results)', wholeNumber)
    .option('--factor <N>', 'design factor for what goes back in, as for resize', designFactor)
    .option('--materials <file>', "the site's materials catalogue (default: the nearest materials.yaml in the case's folder or above)")
    .option('--strict', 'treat the plausibility warnings (values almost certainly mistyped) as errors: exit 2')
    .option('--json', 'print what was written as one JSON object (the folder, the zip, each file, the finding), SI units')
    .action(async (file: string, opts: { template?: string; pdf?: boolean; samples?: number; seed?: number; factor?: number; strict?: boolean; materials?: string; json?: boolean }) => {
      const { reportCommand } = await import('./commands/report.ts');
      await reportCommand(file, opts, io, clock());
    });

  program
    .command('log')
    .description('the incident log of every case under a folder: one row per incident, rollups and the fatigue they add up to per asset')
    .argument('<dir>', 'a folder of case files and case folders')
    .option('--csv', 'print one CSV row per incident')
    .option('--json', 'print one JSON object, SI units')
    .option('--html <file>', 'also write a self-contained page with the figures (a new file, never overwritten)')
    .action(async (dir: string, opts: { csv?: boolean; json?: boolean; html?: string }) => (await import('./commands/log.ts')).logCommand(dir, opts, io, clock()));

  // Each command loads its own modules when it runs (\`await import\`), so --help and a quick
  // check load no more than they use; the report's libraries load only for report.
  try {
    await program.parseAsync(argv, { from: 'user' });
    return 0;
  } catch (e) {
    if (e instanceof CaseError) {
      // Under --json a program reads the mistakes: one JSON object on stderr, same exit status.
      if (argv.includes('--json')) io.err(JSON.stringify((await import('./case-error-json.ts')).caseErrorToJson(e)) + '\n');
      else io.err(`${e.message}\n${e.problems.length} problem${e.problems.length === 1 ? '' : 's'} in ${e.file}; nothing was written.\n`);
      return 2;
    }
    if (e instanceof CommanderError) return e.exitCode === 0 ? 0 : 2;
    if (e instanceof UsageError || e instanceof SystemFault) {
      io.err(`${e.message}\n`);
      return e instanceof UsageError ? 2 : 1;
    }
    throw e;
  }
}
