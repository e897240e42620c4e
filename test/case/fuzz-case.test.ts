import { describe, expect, it } from 'vitest';
import { fuzzCases, unexplainedNonFinite } from '../helpers/case-fuzz.ts';

describe('the case reader under random mutations of the sample cases', () => {
  it('never throws anything but a CaseError, never exits 1, never lets NaN or Infinity out, never takes 5 s of CPU on one input', async () => {
    // A fixed 60 inputs (every 10th also through the CLI's entry), each bounded by 5 s of this
    // process's CPU time, which a busy machine does not stretch; npm run test:slow runs 20 000
    // (test/slow/fuzz-case-*.test.ts).
    const tally = await fuzzCases({ count: 60, seed: 2026, cliEvery: 10 });
    expect(tally).toMatchObject({ inputs: 60, cli: 6 });
  });

  it('an output word with NaN or Infinity counts unless the input itself holds that word (an id, a name, a comment)', () => {
    const input = 'case:\n  id: DEMO-NaN  # Infinity and beyond\n';
    expect(unexplainedNonFinite('DEMO-NaN  peak torque NaN N·m, within Infinity %', input)).toEqual(['NaN']);
    expect(unexplainedNonFinite('<td>DEMO-NaN</td> Infinity', input)).toEqual([]);
    expect(unexplainedNonFinite('x="NaN" y="-Infinity"', 'id: T-1')).toEqual(['NaN', '-Infinity']);
  });
});
