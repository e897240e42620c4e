/**
 * A source as a reader of the report reads it: the published source named, without the library's
 * per-value flags ("from memory, confident", "from memory, verify"), and whether any value it
 * covers was entered from memory. The flags stay in the library (src/materials/library.ts,
 * src/physics/formula-sources.ts); the report says what they mean once.
 */
export function sourceWithoutFlags(source: string): { text: string; fromMemory: boolean } {
  const text = source
    .replace(/\s*\(from memory[^)]*\)/g, '')
    .replace(/;\s*from memory[^);]*(?=\))/g, '')
    .replace(/\s+from memory(, (confident|verify))?/g, '')
    .replace(/\s+([;,.])/g, '$1')
    .trim();
  return { text, fromMemory: /from memory/.test(source) };
}
