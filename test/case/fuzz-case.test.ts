import { describe, expect, it } from 'vitest';
import { fuzzCases } from '../helpers/case-fuzz.ts';

describe('the case reader under random mutations of the sample cases', () => {
  it('never throws anything but a CaseError, never lets NaN or Infinity out, never takes 5 s on one input', () => {
    // A few hundred inputs, or 40 s, whichever comes first; test/slow/ runs 20 000.
    expect(fuzzCases(300, 2026, 40_000)).toBeGreaterThan(30);
  }, 120_000);
});
