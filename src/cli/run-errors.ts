/**
 * The two kinds of failure the CLI prints as one line, without a stack: the operator's mistake
 * outside the case file (an environment value: exit 2), and a fault of the machine around the run
 * (a folder that cannot be written, a full disk, a closed output: exit 1). Anything else is a bug.
 */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}

export { SystemFault } from '../io/system-fault.ts';

/** Latest moment SOURCE_DATE_EPOCH may give: 9999-12-31T23:59:59Z, the last with a four-digit year. */
const MAX_EPOCH = 253_402_300_799;

/**
 * The moment of SOURCE_DATE_EPOCH (seconds since 1970, the reproducible-builds convention), or
 * undefined when it is unset or empty. A value that is not a whole number of seconds from 0 to
 * 253402300799 is a `UsageError`.
 */
export function sourceDateEpoch(value: string | undefined): Date | undefined {
  if (value === undefined || value === '') return undefined;
  if (!/^\d+$/.test(value) || Number(value) > MAX_EPOCH) {
    // The value is shown only when it is short printable ASCII: never a control character of the environment's raw.
    const shown = /^[\x20-\x7e]{1,40}$/.test(value) ? `="${value}"` : ' (its value)';
    throw new UsageError(`SOURCE_DATE_EPOCH${shown} is not a time; give whole seconds since 1970-01-01 UTC from 0 to ${MAX_EPOCH}, such as 1767225600, or unset it`);
  }
  return new Date(Number(value) * 1000);
}
