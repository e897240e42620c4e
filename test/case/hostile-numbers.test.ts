import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { nonFinite, PROBLEM_LINE, runHostile } from '../helpers/hostile-run.ts';

const base = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8') + 'analysis:\n  dynamic_samples: 2\n';

/** Where a hostile number goes: the text to replace, and how to write the number there. */
const FIELDS: [string, (x: string) => string][] = [
  ['speed: 150 rpm', (x) => `speed: ${x} rpm`],
  ['speed: 150 rpm', (x) => `speed: 150 rpm ± ${x} %`],
  ['length: 800 mm', (x) => `length: ${x} mm`],
  ['diameter: 50 mm', (x) => `diameter: ${x} m`],
  ['diameter: 50 mm', (x) => `diameter: 50 mm\n      kt: ${x}`],
  ['diameter: 50 mm', (x) => `diameter: 50 mm\n      bore: ${x} mm`],
  ['mass: 40 kg', (x) => `mass: ${x} kg`],
  ['mass: 40 kg', (x) => `mass: 40 kg\n        count: ${x}`],
  ['mass: 40 kg', (x) => `mass: 40 kg\n        speed_ratio: ${x}`],
  ['radius_of_gyration: 180 mm', (x) => `radius_of_gyration: ${x} mm`],
  ['at: jam\nshaft', (x) => `at: jam\n  duration: ${x} ms\nshaft`],
  ['  material: aisi-1045-cd', (x) => `  material: m\nmaterials:\n  m: { shear_modulus: ${x} Pa, yield_strength: 500 MPa, density: 7850 kg/m^3 }`],
  ['  material: aisi-1045-cd', (x) => `  material: m\nmaterials:\n  m: { shear_modulus: 79 GPa, yield_strength: ${x} MPa, density: 7850 kg/m^3 }`],
  ['dynamic_samples: 2', (x) => `dynamic_samples: 2\n  damping_ratio: ${x}`],
];

const extremes = fc.constantFrom(
  '1e308',
  '1e-308',
  '1e300',
  '1e-300',
  '5e-324',
  '1e400',
  '-1e400',
  '0',
  '-0',
  '-1',
  '1e200',
  '1e-200',
  '0.000001',
  '1e15',
  '9007199254740993',
  'NaN',
  'Infinity',
  '.5',
  '1e+2',
);
const doubles = fc.double({ noNaN: false }).map((d) => String(d));
// Values anywhere from 1e-7 to 1e7, so that many runs pass the limits and reach the engine near its edges.
const logUniform = fc.double({ min: -7, max: 7, noNaN: true }).map((e) => (10 ** e).toPrecision(3));
const hostile = fc.oneof({ arbitrary: extremes, weight: 2 }, { arbitrary: doubles, weight: 1 }, { arbitrary: logUniform, weight: 3 });

describe('hostile numbers in a case file', () => {
  it('every run is refused with positioned problems or completes with finite numbers only', () => {
    let completed = 0;
    fc.assert(
      fc.property(fc.integer({ min: 0, max: FIELDS.length - 1 }), hostile, (f, x) => {
        const [from, to] = FIELDS[f];
        const out = runHostile(base.replace(from, to(x)));
        completed += out.refused ? 0 : 1;
        if (out.refused) {
          for (const line of out.message.split('\n')) expect(line).toMatch(PROBLEM_LINE);
          expect(out.message.replace(/"[^"]*"/g, '')).not.toMatch(/NaN|Infinity/); // the value as written may say NaN; nothing else
        } else {
          expect(nonFinite(out.json)).toEqual([]);
          expect(out.summary).not.toMatch(/NaN|Infinity/);
        }
      }),
      { numRuns: 120, seed: 13 },
    );
    expect(completed).toBeGreaterThan(20); // the engine itself was reached, not only the reader
  }, 120_000);
});
