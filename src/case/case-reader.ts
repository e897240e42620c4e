import { isMap, isScalar, isSeq, type Document, type LineCounter, type Node, type YAMLMap } from 'yaml';
import { parseQuantity, QuantityError, type Quantity, type Tolerance } from '../units/quantity.ts';
import { type QuantityKind, KIND_EXAMPLES } from '../units/unit-table.ts';
import { formatPath, type CaseErrorCode, type CaseProblem, type SourcePosition } from './case-error.ts';
import { didYouMean } from './did-you-mean.ts';
import { KIND_LIMITS, SIZE_LIMITS, type Limit } from './limits.ts';

export type Path = readonly (string | number)[];

/** What a reader asked of a field: for the test that holds the readers to the case's description (case-shape.ts). */
export type FieldRead =
  | { type: 'mapping'; keys: readonly string[] }
  | { type: 'list' }
  | { type: 'text'; allowed?: readonly string[] }
  | { type: 'number' }
  | { type: 'boolean' }
  | { type: 'quantity'; kind: QuantityKind };

/** Told of every field a reader reads; see FieldRead. */
export type ReadObserver = (path: Path, read: FieldRead) => void;

interface FieldOptions {
  required?: boolean;
}

/**
 * Typed access to a parsed YAML case document that remembers where each value stands, so every
 * problem is reported with its line, column and field path. Problems are collected, not thrown:
 * the parser reports all of a file's mistakes at once.
 */
export class CaseReader {
  readonly problems: CaseProblem[] = [];
  /** The ± bands of every quantity read, by field path. */
  readonly tolerances: Record<string, Tolerance> = Object.create(null);

  constructor(
    private readonly doc: Document,
    private readonly lines: LineCounter,
    private readonly observe?: ReadObserver,
  ) {}

  /** The node at `path`, or undefined when absent or null. */
  node(path: Path): Node | undefined {
    const n = path.length === 0 ? (this.doc.contents as Node | null) : (this.doc.getIn(path, true) as Node | undefined);
    if (n == null) return undefined;
    if (isScalar(n) && n.value == null) return undefined;
    return n;
  }

  has(path: Path): boolean {
    return this.node(path) !== undefined;
  }

  /** Source position of the value at `path`, or of its nearest present ancestor. */
  position(path: Path): SourcePosition | undefined {
    for (let n = path.length; n >= 0; n--) {
      const node = n === 0 ? (this.doc.contents as Node | null) : (this.doc.getIn(path.slice(0, n), true) as Node | undefined);
      if (node?.range) return this.at(node.range[0]);
    }
    return undefined;
  }

  private at(offset: number): SourcePosition {
    const { line, col } = this.lines.linePos(offset);
    return { line, column: col };
  }

  fail(code: CaseErrorCode, path: Path, message: string, position = this.position(path)): void {
    this.problems.push({ code, path: formatPath(path), message, position });
  }

  private missing(path: Path, example: string): void {
    this.fail('E_MISSING', path, `is required; give ${example}`);
  }

  /**
   * A mapping with only the `keys` given; unknown keys are reported with a did-you-mean.
   * Returns whether a mapping is there.
   */
  map(path: Path, keys: readonly string[], opts: FieldOptions & { example?: string } = {}): boolean {
    this.observe?.(path, { type: 'mapping', keys });
    const n = this.node(path);
    if (n === undefined) {
      if (opts.required) this.missing(path, opts.example ?? `a mapping with ${keys.slice(0, 3).join(', ')}`);
      return false;
    }
    if (!isMap(n)) {
      this.fail('E_TYPE', path, `should be a mapping of ${keys.slice(0, 4).join(', ')}…, not ${describe(n)}`);
      return false;
    }
    n.items.forEach((pair, i) => {
      const key = isScalar(pair.key) ? String(pair.key.value) : String(pair.key);
      if (keys.includes(key)) return;
      const guess = didYouMean(key, keys);
      const hint = commaInFlow(n, i) ?? (guess ? `did you mean "${guess}"?` : `known keys here: ${keys.join(', ')}`);
      const pos = isScalar(pair.key) && pair.key.range ? this.at(pair.key.range[0]) : this.position(path);
      this.fail('E_UNKNOWN_KEY', [...path, key], `unknown key; ${hint}`, pos);
    });
    return true;
  }

  /** Keys of the mapping at `path` (for maps keyed by name, such as `materials`). */
  keys(path: Path): string[] {
    const n = this.node(path);
    if (!n || !isMap(n)) return [];
    return n.items.map((p) => (isScalar(p.key) ? String(p.key.value) : String(p.key)));
  }

  /**
   * Length of the list at `path`; 0 (with a problem if required) when absent or not a list, and 0
   * with a problem when it has more than `max` items (default `SIZE_LIMITS.listItems`), so no work
   * is done on a list without bound.
   */
  list(path: Path, opts: FieldOptions & { example?: string; max?: number; what?: string } = {}): number {
    this.observe?.(path, { type: 'list' });
    const n = this.node(path);
    if (n === undefined) {
      if (opts.required) this.missing(path, opts.example ?? 'a list');
      return 0;
    }
    if (!isSeq(n)) {
      this.fail('E_TYPE', path, `should be a list (items starting with "- "), not ${describe(n)}`);
      return 0;
    }
    const max = opts.max ?? SIZE_LIMITS.listItems;
    if (n.items.length > max) {
      this.fail('E_RANGE', path, `has ${n.items.length} ${opts.what ?? 'items'}, more than the ${max} a case may have; ${opts.what ? `give at most ${max}` : 'shorten the list'}`);
      return 0;
    }
    return n.items.length;
  }

  /** A scalar as text; numbers and dates are taken as their text. */
  string(path: Path, opts: FieldOptions & { example?: string; allowed?: readonly string[] } = {}): string | undefined {
    this.observe?.(path, { type: 'text', allowed: opts.allowed });
    const n = this.node(path);
    if (n === undefined) {
      if (opts.required) this.missing(path, opts.example ?? 'a text');
      return undefined;
    }
    if (!isScalar(n)) {
      this.fail('E_TYPE', path, `should be a single value, not ${describe(n)}`);
      return undefined;
    }
    const text = String(n.value);
    if (opts.allowed && !opts.allowed.includes(text)) {
      const guess = didYouMean(text, opts.allowed);
      this.fail('E_RANGE', path, `"${text}" is not one of ${opts.allowed.join(', ')}${guess ? `; did you mean "${guess}"?` : ''}`);
      return undefined;
    }
    return text;
  }

  /** A plain number (counts, ratios, factors). */
  number(path: Path, opts: FieldOptions & { example: string; positive?: boolean; min?: number; max?: number; integer?: boolean }): number | undefined {
    this.observe?.(path, { type: 'number' });
    const n = this.node(path);
    if (n === undefined) {
      if (opts.required) this.missing(path, opts.example);
      return undefined;
    }
    const v = isScalar(n) ? n.value : undefined;
    if (typeof v === 'number' && !Number.isFinite(v)) {
      this.fail('E_RANGE', path, `is not a finite number (too large, or not a number at all); give ${opts.example}`);
      return undefined;
    }
    if (typeof v !== 'number') {
      this.fail('E_TYPE', path, `${isScalar(n) ? `"${String(v)}"` : describe(n)} is not a plain number; give ${opts.example}`);
      return undefined;
    }
    if (opts.integer && !Number.isInteger(v)) {
      this.fail('E_RANGE', path, `${v} is not a whole number; give ${opts.example}`);
      return undefined;
    }
    if ((opts.positive && v <= 0) || (opts.min !== undefined && v < opts.min) || (opts.max !== undefined && v > opts.max)) {
      this.fail('E_RANGE', path, `${v} is out of range; give ${opts.example}`);
      return undefined;
    }
    return v;
  }

  boolean(path: Path, opts: FieldOptions = {}): boolean | undefined {
    this.observe?.(path, { type: 'boolean' });
    const n = this.node(path);
    if (n === undefined) {
      if (opts.required) this.missing(path, 'true or false');
      return undefined;
    }
    if (!isScalar(n) || typeof n.value !== 'boolean') {
      this.fail('E_TYPE', path, 'should be true or false');
      return undefined;
    }
    return n.value;
  }

  /**
   * A quantity with its unit, converted to SI. `positive` rejects zero and negatives; `nonNegative`
   * only negatives. Its magnitude (unless zero) must lie within `limit` (default: the kind's, in
   * src/case/limits.ts), and a ± band must be narrower than the value, so that the quantity it
   * spans stays above zero.
   */
  quantity(path: Path, kind: QuantityKind, opts: FieldOptions & { positive?: boolean; nonNegative?: boolean; example?: string; limit?: Limit } = {}): Quantity | undefined {
    this.observe?.(path, { type: 'quantity', kind });
    const n = this.node(path);
    const example = opts.example ?? KIND_EXAMPLES[kind];
    if (n === undefined) {
      if (opts.required) this.missing(path, example);
      return undefined;
    }
    if (!isScalar(n) || (typeof n.value !== 'string' && typeof n.value !== 'number')) {
      this.fail('E_TYPE', path, `should be a value with its unit, not ${describe(n)}; give ${example}`);
      return undefined;
    }
    let q: Quantity;
    try {
      q = parseQuantity(n.value as string | number, kind);
    } catch (e) {
      if (e instanceof QuantityError) {
        this.fail('E_UNIT', path, e.message);
        return undefined;
      }
      throw e;
    }
    if (!Number.isFinite(q.value)) {
      this.fail('E_RANGE', path, `is not a finite number (too large, or not a number at all); give ${example}`);
      return undefined;
    }
    if ((opts.positive && q.value <= 0) || (opts.nonNegative && q.value < 0)) {
      const need = opts.positive ? 'greater than zero' : 'zero or more';
      this.fail('E_RANGE', path, `"${String(n.value)}" must be ${need}; give ${example}`);
      return undefined;
    }
    const limit = opts.limit ?? KIND_LIMITS[kind];
    const size = Math.abs(q.value);
    if (size !== 0 && (size < limit.min || size > limit.max)) {
      this.fail('E_RANGE', path, `"${String(n.value)}" is out of range (${limit.text}); give ${example}`);
      return undefined;
    }
    if (q.tolerance) {
      const band = q.tolerance.kind === 'relative' ? q.tolerance.fraction * size : q.tolerance.value;
      // A value that may be zero (a measured twist of "0 deg ± 0.5 deg") may carry a band down to
      // zero; the Monte Carlo holds its draws at zero. One that must be positive needs a band
      // narrower than itself.
      if (!Number.isFinite(band) || (opts.positive && band >= size) || (!opts.positive && size !== 0 && band > size)) {
        this.fail('E_RANGE', path, `"${String(n.value)}": the ± band is not narrower than the value, so the quantity could be zero or negative; give a band smaller than the value, such as "± 3 %"`);
        return undefined;
      }
      this.tolerances[formatPath(path)] = q.tolerance;
    }
    return q;
  }
}

function describe(n: Node): string {
  if (isMap(n)) return 'a mapping';
  if (isSeq(n)) return 'a list';
  if (isScalar(n)) return `"${String(n.value)}"`;
  return 'this value';
}

/**
 * Where an unknown key of a `{ … }` mapping is text with no value after a plain value, the user most
 * likely wrote a comma inside that value (`method: keyway offset, read with a protractor`): in a
 * flow mapping the comma ends the value and the rest reads as a key. The hint says to quote it.
 */
function commaInFlow(n: YAMLMap, i: number): string | undefined {
  const pair = n.items[i];
  const prev = n.items[i - 1];
  if (!n.flow || i === 0 || pair.value !== null || !isScalar(pair.key) || !prev || !isScalar(prev.key) || !isScalar(prev.value)) return undefined;
  const whole = `${String(prev.value.value)}, ${String(pair.key.value)}`;
  return `a comma inside a { … } mapping ends a value, so "${String(pair.key.value)}" reads as a key; if it belongs to ${String(prev.key.value)}, put the whole value in quotes: ${String(prev.key.value)}: "${whole}"`;
}
