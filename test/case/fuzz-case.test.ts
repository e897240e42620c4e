import { describe, expect, it } from 'vitest';
import { fuzzCases } from '../helpers/case-fuzz.ts';

describe('the case reader under random mutations of the sample cases', () => {
  it('never throws anything but a CaseError, never lets NaN or Infinity out', () => {
    // A fixed 60 inputs, whatever the machine's load: no time bound here (the suite never fails
    // for being slow); npm run test:fuzz runs 20 000 with a bound of 5 s an input.
    expect(fuzzCases(60, 2026, Infinity, Infinity)).toBe(60);
  });
});
