import { describe, expect, it } from 'vitest';
import { FULL_FUZZ, fuzzShard } from '../helpers/case-fuzz.ts';

// One of the shards of the full fuzz (test/helpers/case-fuzz.ts, FULL_FUZZ): a file each, so vitest runs them on both cores.
describe(`the case reader under random mutations of the sample cases, shard 1 of ${FULL_FUZZ.shards}`, () => {
  it('never throws anything but a CaseError, never exits 1, never lets NaN or Infinity out, never takes 5 s of CPU on one input', async () => {
    expect((await fuzzShard(1)).inputs).toBe(FULL_FUZZ.inputs / FULL_FUZZ.shards);
  }, 3600_000);
});
