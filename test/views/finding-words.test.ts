import { describe, expect, it } from 'vitest';
import { chanceSentence, percent, verdictWord } from '../../src/views/finding-words.ts';
import type { Finding } from '../../src/finding/finding.ts';

describe('finding words', () => {
  it('percent(p) keeps a chance near 0 or 100 % off 0 and 100 unless it is exactly so', () => {
    expect(percent(0)).toBe('0');
    expect(percent(1)).toBe('100');
    expect(percent(0.36)).toBe('36');
    expect(percent(0.0004)).toBe('0.04');
    // Wilson's lower bound for 10000 of 10000 (Wilson 1927): 1 − 3.84e-4.
    expect(percent(1 - 3.84e-4)).toBe('99.96');
    expect(percent(0.995)).toBe('99.5');
  });

  it('verdictWord names the four states, a brittle stress raiser as over its strength', () => {
    expect(verdictWord({ verdict: 'elastic', brittle: false })).toBe('ELASTIC');
    expect(verdictWord({ verdict: 'yielded locally', brittle: false })).toBe('YIELDED LOCALLY AT A STRESS RAISER');
    expect(verdictWord({ verdict: 'yielded locally', brittle: true })).toBe('OVER ITS STRENGTH AT A STRESS RAISER');
    expect(verdictWord({ verdict: 'yielded', brittle: false })).toBe('YIELDED THROUGH THE SECTION');
    expect(verdictWord({ verdict: 'fracture predicted', brittle: false })).toBe('FRACTURE PREDICTED');
  });

  it('chanceSentence says how the chance was obtained and its interval', () => {
    const f = { chance: { model: 'dynamic model', probability: 0.36, interval: [0.31, 0.413], method: 'control-variates', runs: 40, controlSamples: 10000 } } as unknown as Finding;
    expect(chanceSentence(f)).toBe(
      "Chance of yield under the case's tolerances: 36 % (95 % interval 31 % to 41 %), from 40 runs of the dynamic model, corrected by 10000 energy-method samples of the same draws (control variates).",
    );
    expect(chanceSentence({ chance: undefined } as unknown as Finding)).toBeUndefined();
  });
});
