// The mirrored-shaft law of the energy method at fast-check's full 100 layouts (the default suite,
// test/results/analyse-case.test.ts, runs 20): each layout is two solves of the whole engine with
// two sides and refinement of the dynamic model, about 0.2 s each.
import fc from 'fast-check';
import { describe, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';

/** Segments [length mm, diameter mm], stations [name, at mm, inertia kg·m² (0 = no parts)]. */
function caseText(rpm: number, segments: [number, number][], stations: [string, number, number][]): string {
  const seg = segments.map(([len, d]) => `    - { length: ${len} mm, diameter: ${d} mm }`).join('\n');
  const st = stations.map(([n, at, j]) => `  - name: ${n}\n    at: ${at} mm\n${j > 0 ? `    parts:\n      - { shape: inertia, inertia: ${j} kg*m^2 }\n` : ''}`).join('');
  return `case: { id: P }\nspeed: ${rpm} rpm\nstop: { at: jam }\nshaft:\n  material: aisi-1045-cd\n  segments:\n${seg}\nstations:\n${st}`;
}

describe('the laws of the energy method, at full strength', () => {
  it('a mirrored shaft gives mirrored sides (100 layouts)', () => {
    const arb = fc.record({
      rpm: fc.double({ min: 10, max: 3000, noNaN: true }),
      len: fc.integer({ min: 100, max: 3000 }),
      d: fc.integer({ min: 10, max: 200 }),
      j: fc.double({ min: 0.01, max: 100, noNaN: true }),
    });
    fc.assert(
      fc.property(arb, fc.integer({ min: 10, max: 200 }), fc.double({ min: 0.01, max: 100, noNaN: true }), ({ rpm, len, d, j }, d2, j2) => {
        const fwd = analyseCase(
          parseCase(
            caseText(
              rpm,
              [
                [len, d],
                [len, d2],
              ],
              [
                ['a', 0, j],
                ['jam', len, 0],
                ['b', 2 * len, j2],
              ],
            ),
          ),
        );
        const rev = analyseCase(
          parseCase(
            caseText(
              rpm,
              [
                [len, d2],
                [len, d],
              ],
              [
                ['b', 0, j2],
                ['jam', len, 0],
                ['a', 2 * len, j],
              ],
            ),
          ),
        );
        return (
          Math.abs(fwd.sides[0].peakTorque / rev.sides[1].peakTorque - 1) < 1e-12 &&
          Math.abs(fwd.sides[1].peakTorque / rev.sides[0].peakTorque - 1) < 1e-12 &&
          Math.abs(fwd.maxShearStress / rev.maxShearStress - 1) < 1e-12
        );
      }),
      { numRuns: 100 },
    );
  }, 600_000);
});
