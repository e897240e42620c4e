import { LineCounter, parseDocument } from 'yaml';
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
