/** Stable codes for the mistakes a case file can hold. */
export type CaseErrorCode =
  | 'E_YAML' // not valid YAML
  | 'E_UNKNOWN_KEY' // a key the case format does not have
  | 'E_MISSING' // a required field is absent
  | 'E_TYPE' // a field of the wrong type (a list where a mapping belongs, …)
  | 'E_UNIT' // a value with no unit, an unknown unit or a unit of the wrong kind
  | 'E_RANGE' // a value out of its range (negative length, bore ≥ diameter, station off the shaft)
  | 'E_REFERENCE' // a name that refers to nothing (station, material)
  | 'E_MATERIAL' // a material lacks a property its use needs
  | 'E_MODEL' // the case as a whole cannot be modelled (nothing turning, …)
  | 'E_IMPLAUSIBLE' // a value almost certainly mistyped (a plausibility warning, an error under --strict)
  | 'E_FILE' // the case file or a file it names cannot be read
  | 'E_TEMPLATE'; // a report template with a placeholder it cannot fill

/** Where in the case file a problem is: 1-based line and column. */
export interface SourcePosition {
  line: number;
  column: number;
}

/** One mistake in a case file. */
export interface CaseProblem {
  code: CaseErrorCode;
  /** Field path such as `shaft.segments[1].diameter`; empty for the whole file. */
  path: string;
  message: string;
  position?: SourcePosition;
}

/** Field path as the user reads it: `shaft.segments[1].diameter`. */
export function formatPath(path: readonly (string | number)[]): string {
  return path.map((p, i) => (typeof p === 'number' ? `[${p}]` : i === 0 ? p : `.${p}`)).join('');
}

/**
 * The user's mistakes in one case file, all of them at once. The CLI prints `lines()` and exits 2;
 * anything else thrown is a bug.
 */
export class CaseError extends Error {
  readonly file: string;
  readonly problems: readonly CaseProblem[];

  constructor(file: string, problems: readonly CaseProblem[]) {
    super(problems.map((p) => formatProblem(file, p)).join('\n'));
    this.name = 'CaseError';
    this.file = file;
    this.problems = problems;
  }

  /** The first problem's code, for callers that care about one. */
  get code(): CaseErrorCode {
    return this.problems[0].code;
  }
}

/**
 * `case.yaml:14:17 shaft.segments[1].diameter: "40" has no unit; …`: one line, always. A value or
 * key the message quotes may hold a line break (YAML folds an empty line inside a plain value into
 * one, and a quoted value may spell "\n"); it is shown as the two characters \n, so no user text
 * starts a line of its own that reads as another problem.
 */
export function formatProblem(file: string, p: CaseProblem): string {
  const where = p.position ? `${file}:${p.position.line}:${p.position.column}` : file;
  return (p.path ? `${where} ${p.path}: ${p.message}` : `${where}: ${p.message}`).replace(/\r\n|\r|\n/g, '\\n');
}
