import { describe, expect, it } from 'vitest';
import { chanceOfYieldWords, inputQuantity } from '../../src/views/uncertainty-summary.ts';

describe('inputQuantity', () => {
  it('inputQuantity names the kind of quantity a field path holds, and none for what is shown in SI', () => {
    expect(inputQuantity('speed')).toBe('speed');
    expect(inputQuantity('shaft.segments[1].diameter')).toBe('length');
    expect(inputQuantity('stations[0].parts[2].radius_of_gyration')).toBe('length');
    expect(inputQuantity('stations[0].parts[0].inertia')).toBe('inertia');
    expect(inputQuantity('observed.permanent_twist[0].angle')).toBe('angle');
    expect(inputQuantity('materials.aisi-1045-cd.yield_strength')).toBe('stress');
    expect(inputQuantity('materials.aisi-1045-cd.density')).toBeUndefined();
    expect(inputQuantity('stations[0].parts[0].mass')).toBeUndefined();
    expect(inputQuantity('materials.x.constructor')).toBeUndefined();
  });
});

describe('chanceOfYieldWords', () => {
  it('chanceOfYieldWords says none, every one, or the share of the samples that reach yield', () => {
    expect(chanceOfYieldWords({ yieldProbability: 0, samples: 10000 })).toBe('None of the 10000 samples reaches a stress / shear yield of 1 (the chance of yield is below 1 in 10000)');
    expect(chanceOfYieldWords({ yieldProbability: 1, samples: 500 })).toBe('Every one of the 500 samples reaches a stress / shear yield of 1 or more');
    expect(chanceOfYieldWords({ yieldProbability: 4 / 10000, samples: 10000 })).toBe('0.04 % of the 10000 samples reach a stress / shear yield of 1 or more');
  });
});
