import { describe, expect, it } from 'vitest';
import { showDiameter } from '../../src/views/show-diameter.ts';

describe('showDiameter', () => {
  it('writes inch sizes on the 1/16 in grid as fractions', () => {
    expect(showDiameter((2 + 7 / 16) * 0.0254, 'us')).toBe('2 7/16 in');
    expect(showDiameter(3.125 * 0.0254, 'us')).toBe('3 1/8 in');
    expect(showDiameter(0.5 * 0.0254, 'us')).toBe('1/2 in');
    expect(showDiameter(3 * 0.0254, 'us')).toBe('3 in');
  });

  it('writes other inch sizes as decimals and metric sizes in millimetres', () => {
    expect(showDiameter(3.1261 * 0.0254, 'us')).toBe('3.126 in');
    expect(showDiameter(0.0552, 'metric')).toBe('55.2 mm');
    expect(showDiameter(0.055, 'metric')).toBe('55 mm');
  });
});
