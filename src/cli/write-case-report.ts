import type { ReportOptions } from './commands/report.ts';

/**
 * Writes a case's report folder and zip beside the case, as `shaftcase report` does, and returns
 * what the command would print (the files written, the finding) and its notes (a PDF not written).
 * The report's libraries load on the first call.
 */
export async function writeCaseReport(path: string, opts: ReportOptions = {}, now: Date = new Date()): Promise<{ out: string; err: string }> {
  let out = '';
  let err = '';
  const { reportCommand } = await import('./commands/report.ts');
  await reportCommand(path, opts, { out: (t) => (out += t), err: (t) => (err += t) }, now);
  return { out, err };
}
