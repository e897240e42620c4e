import { describe, expect, it } from 'vitest';
import { FULL_FUZZ, fuzzShard } from '../helpers/case-fuzz.ts';

// One of the shards of the full fuzz (test/helpers/case-fuzz.ts, FULL_FUZZ): a file each, so vitest runs them on both cores.
describe(`the case reader under random mutations of the sample cases, shard 1 of ${FULL_FUZZ.shards}`, () => {
  it('never throws anything but a CaseError, never exits 1, never lets NaN or Infinity out, never takes 5 s of CPU on one input', async () => {
    const tally = await fuzzShard(1);
    expect(tally.inputs).toBe(FULL_FUZZ.inputs / FULL_FUZZ.shards);
    // The built CLI (npm test and the package test build it) and report ran too, not only the reader.
    expect(tally.processes).toBeGreaterThan(0);
    expect(tally.reports).toBeGreaterThan(0);
  }, 3600_000);
});
