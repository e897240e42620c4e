/** When and by which version a report was written; the clock is read at the CLI's edge and passed in. */
export interface RunInfo {
  /** The tool's version, from package.json. */
  version: string;
  /** Local date of the run, `YYYY-MM-DD`; it names the report folder. */
  date: string;
  /** Local time of the run with its UTC offset, `HH:MM UTC+01:00`, so that a reader elsewhere knows the moment. */
  time: string;
  /** Local date and time with the UTC offset, ISO 8601: `2026-12-01T14:05:09+01:00`. */
  iso: string;
}

const pad = (n: number, w = 2) => String(n).padStart(w, '0');

/** The run's date and time in the machine's time zone (pure: the moment is given). */
export function runInfo(now: Date, version: string): RunInfo {
  const date = `${pad(now.getFullYear(), 4)}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
  const time = `${pad(now.getHours())}:${pad(now.getMinutes())}`;
  const offset = -now.getTimezoneOffset();
  const sign = offset >= 0 ? '+' : '-';
  const zone = `${sign}${pad(Math.floor(Math.abs(offset) / 60))}:${pad(Math.abs(offset) % 60)}`;
  return { version, date, time: `${time} UTC${zone}`, iso: `${date}T${time}:${pad(now.getSeconds())}${zone}` };
}
