import { statSync } from 'node:fs';
import { SystemFault, systemFault } from '../../io/system-fault.ts';
import { writeNewFile } from '../../io/write-new-file.ts';
import { buildLog } from '../../log/build-log.ts';
import { logToCsv } from '../../views/log-csv.ts';
import { logToJson } from '../../views/log-json.ts';
import { renderLogPage } from '../../views/log-page.ts';
import { renderLog } from '../../views/log-table.ts';
import { collectIncidents } from '../collect-incidents.ts';
import type { Io } from '../io.ts';
import { UsageError } from '../run-errors.ts';

export interface LogOptions {
  csv?: boolean;
  json?: boolean;
  /** Write the page here (a new file; never over an existing one). */
  html?: string;
}

/** `shaftcase log DIR`: the incident log of every case under DIR, with rollups per asset. */
export async function logCommand(dir: string, opts: LogOptions, io: Io, now: Date): Promise<void> {
  let isDir = false;
  try {
    isDir = statSync(dir).isDirectory();
  } catch {
    isDir = false;
  }
  if (!isDir) throw new UsageError(`${dir} is not a folder; give the folder that holds the case files, such as sample-cases/`);
  if (opts.csv && opts.json) throw new UsageError('give --csv or --json, not both');
  const { rows, notes } = collectIncidents(dir);
  const log = buildLog(rows);
  if (opts.html) {
    try {
      writeNewFile(opts.html, renderLogPage(log, now.toISOString(), notes));
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code === 'EEXIST')
        throw new UsageError(`${opts.html} exists; the log never writes over a file: give a new name, such as incident-log-${now.toISOString().slice(0, 10)}.html`);
      throw systemFault(e, 'the log page', opts.html) ?? (e instanceof SystemFault ? e : e);
    }
  }
  if (opts.json) {
    io.out(JSON.stringify(logToJson(log), null, 2) + '\n');
    for (const n of notes) io.err(`${n}\n`);
  } else if (opts.csv) {
    io.out(logToCsv(log));
    for (const n of notes) io.err(`${n}\n`);
  } else {
    io.out(renderLog(log, notes));
  }
  if (opts.html) io.err(`Wrote ${opts.html}\n`);
}
