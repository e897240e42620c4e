import { createCaseFolder } from '../../io/create-case-folder.ts';
import type { Io } from '../io.ts';

export function newCommand(folder: string, opts: { units: 'metric' | 'us' }, io: Io): void {
  const made = createCaseFolder(folder, opts.units);
  const lines = [`Created the case folder ${folder} (${opts.units} units):`, ...made.created.map((p) => `  ${p}`)];
  for (const p of made.kept) lines.push(`  kept ${p} as it was`);
  lines.push(
    '',
    `Next: fill in ${made.caseFile} (its comments say what to measure and how), put the photos in the photos folder,`,
    `then run: shaftcase check ${folder}   and   shaftcase report ${folder}`,
  );
  io.out(lines.join('\n') + '\n');
}
