import { isMap, isScalar, isSeq, LineCounter, parseDocument } from 'yaml';
import type { SourcePosition } from './case-error.ts';

/**
 * Where the value at `path` stands in a case file's text, for errors found after parsing (a photo
 * missing on disk). Undefined when the path is not in the text.
 */
export function positionInText(text: string, path: readonly (string | number)[]): SourcePosition | undefined {
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines });
  const node = doc.getIn(path, true) as { range?: [number, number, number] } | undefined;
  if (!node?.range) return undefined;
  const { line, col } = lines.linePos(node.range[0]);
  return { line, column: col };
}

/** A scalar of the case file as written, and where it stands. */
export interface SourceValue {
  /** Field path, such as `['shaft', 'segments', 1, 'diameter']`. */
  path: (string | number)[];
  /** The value's text as written (a number is its text). */
  text: string;
  position: SourcePosition;
}

/**
 * The case file's scalars by field path, from one parse of the text: for checks that look at a
 * value as written (its unit spelling) and point at it. `at` is undefined for a path that is not a
 * scalar in the text; `all` lists every scalar value (not the keys), in the order of the text.
 */
export function sourceValues(text: string): { at(path: readonly (string | number)[]): SourceValue | undefined; all(): SourceValue[] } {
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines });
  const value = (node: unknown, path: (string | number)[]): SourceValue | undefined => {
    if (!isScalar(node) || !node.range || node.value == null) return undefined;
    const { line, col } = lines.linePos(node.range[0]);
    return { path, text: String(node.value), position: { line, column: col } };
  };
  const walk = (node: unknown, path: (string | number)[], out: SourceValue[]): void => {
    if (isMap(node)) for (const pair of node.items) walk(pair.value, [...path, isScalar(pair.key) ? String(pair.key.value) : String(pair.key)], out);
    else if (isSeq(node)) node.items.forEach((item, i) => walk(item, [...path, i], out));
    else {
      const v = value(node, path);
      if (v) out.push(v);
    }
  };
  return {
    at: (path) => value(doc.getIn(path, true), [...path]),
    all: () => {
      const out: SourceValue[] = [];
      walk(doc.contents, [], out);
      return out;
    },
  };
}
