import { describe, expect, it } from 'vitest';
import { fuzzCases } from '../helpers/case-fuzz.ts';

describe('the case reader under 20 000 random mutations of the sample cases', () => {
  it(
    'never throws anything but a CaseError, never lets NaN or Infinity out, never takes 5 s on one input',
    () => {
      expect(fuzzCases(20_000, 13, Infinity)).toBe(20_000);
    },
    6 * 3600_000,
  );
});
