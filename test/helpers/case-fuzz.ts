// Random mutations of case files for the fuzz tests of the case reader (test/case/fuzz-case.test.ts,
// and at full count test/slow/fuzz-case.test.ts): every input is either refused with positioned
// problems or runs with finite numbers, never a stack trace, within a time bound per input.
import { readdirSync, readFileSync } from 'node:fs';
import { expect } from 'vitest';
import { nonFinite, PROBLEM_LINE, runHostile } from './hostile-run.ts';

const dir = new URL('../../sample-cases/', import.meta.url);
export const SAMPLE_TEXTS = readdirSync(dir)
  .filter((f) => f.endsWith('.yaml'))
  .sort()
  .map((f) => readFileSync(new URL(f, dir), 'utf8'));

/** A small seeded generator (mulberry32), so a failure can be repeated from its seed. */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const HOSTILE_NUMBERS = ['1e308', '1e-308', '0', '-1', '1e400', 'NaN', '1e-300', '99999999', '0.0000001', '-0', '1/0', '3 7/0'];
const HOSTILE_TEXT = ['\u0000', '\u001b[2J', '\u202e', '__proto__', 'constructor', '{{toString}}', '\t', ': ', '- ', '{', '[', '"', '&a', '*a', '!!binary', '? '];

/** One to three random edits of `text`. */
export function mutate(text: string, rnd: () => number): string {
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(rnd() * xs.length)];
  let t = text;
  const edits = 1 + Math.floor(rnd() * 3);
  for (let e = 0; e < edits; e++) {
    const lines = t.split('\n');
    const i = Math.floor(rnd() * lines.length);
    switch (Math.floor(rnd() * 8)) {
      case 0: {
        const numbers = [...t.matchAll(/\d+(\.\d+)?/g)];
        if (numbers.length === 0) break;
        const m = pick(numbers);
        t = t.slice(0, m.index) + pick(HOSTILE_NUMBERS) + t.slice(m.index! + m[0].length);
        break;
      }
      case 1:
        lines.splice(i, 1);
        t = lines.join('\n');
        break;
      case 2:
        lines.splice(i, 0, lines[i]);
        t = lines.join('\n');
        break;
      case 3: {
        // Toggle the case of a letter: "mm" → "Mm", "MPa" → "mPa".
        const at = Math.floor(rnd() * t.length);
        const c = t[at];
        t = t.slice(0, at) + (c === c.toUpperCase() ? c.toLowerCase() : c.toUpperCase()) + t.slice(at + 1);
        break;
      }
      case 4: {
        const at = Math.floor(rnd() * t.length);
        t = t.slice(0, at) + pick(HOSTILE_TEXT) + t.slice(at);
        break;
      }
      case 5:
        t = t.slice(0, Math.floor(rnd() * t.length));
        break;
      case 6: {
        // Swap two lines: keys move between mappings, lists lose their order.
        const j = Math.floor(rnd() * lines.length);
        [lines[i], lines[j]] = [lines[j], lines[i]];
        t = lines.join('\n');
        break;
      }
      default: {
        // Replace a value with another line's value.
        const values = [...t.matchAll(/: ([^\n#]+)/g)];
        if (values.length < 2) break;
        const [a, b] = [pick(values), pick(values)];
        t = t.slice(0, a.index! + 2) + b[1] + t.slice(a.index! + 2 + a[1].length);
      }
    }
  }
  return t;
}

/** Runs mutated sample cases until `count` are done or `budgetMs` has passed; returns how many ran. */
export function fuzzCases(count: number, seed: number, budgetMs: number, perInputMs = 5000): number {
  const rnd = seeded(seed);
  const start = performance.now();
  let done = 0;
  for (; done < count && performance.now() - start < budgetMs; done++) {
    const text = mutate(SAMPLE_TEXTS[done % SAMPLE_TEXTS.length], rnd);
    const t0 = performance.now();
    let out;
    try {
      out = runHostile(text, 0);
    } catch (e) {
      throw new Error(`input ${done} (seed ${seed}) threw ${(e as Error).stack}\n--- input ---\n${text}`);
    }
    const took = performance.now() - t0;
    expect(took, `input ${done} (seed ${seed}) took ${took.toFixed(0)} ms:\n${text}`).toBeLessThan(perInputMs);
    if (out.refused) {
      for (const line of out.message.split('\n')) expect(line, `input ${done} (seed ${seed})`).toMatch(PROBLEM_LINE);
    } else {
      expect(nonFinite(out.json), `input ${done} (seed ${seed}):\n${text}`).toEqual([]);
      expect(out.summary, `input ${done} (seed ${seed})`).not.toMatch(/NaN|Infinity/);
    }
  }
  return done;
}
