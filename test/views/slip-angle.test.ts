import { describe, expect, it } from 'vitest';
import { showSlipAngle } from '../../src/views/slip-angle.ts';

describe('showSlipAngle', () => {
  it('gives degrees below a turn and turns above', () => {
    expect(showSlipAngle(Math.PI / 2, 'metric')).toBe('90°');
    expect(showSlipAngle(6 * Math.PI, 'us')).toBe('3 turns (1080°)');
  });
});
