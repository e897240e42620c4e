import { describe, expect, it } from 'vitest';
import { limiterSegment, withLimiter } from '../../src/resize/limiter-segment.ts';
import { caseOf } from '../helpers/layout.ts';

describe('the segment that holds a limiter placed at a station', () => {
  it('skips a segment with the station inside it and takes the next piece toward the stop', () => {
    const c = caseOf({ rpm: 300, segments: [[100, 40, 0], [200, 45, 0], [300, 50, 0]], stations: [['disc', 50, 1], ['jam', 600, 0]], stop: 'jam' });
    expect(limiterSegment(c, 'disc')?.index).toBe(1);
  });

  it('works on either side of the stop', () => {
    const c = caseOf({ rpm: 300, segments: [[300, 50, 0], [200, 45, 0], [100, 40, 0]], stations: [['jam', 0, 0], ['disc', 550, 1]], stop: 'jam' });
    expect(limiterSegment(c, 'disc')?.index).toBe(1);
  });

  it('takes the segment starting at the station when the station sits on a segment end', () => {
    const c = caseOf({ rpm: 300, segments: [[100, 40, 0], [400, 45, 0]], stations: [['disc', 100, 1], ['jam', 500, 0]], stop: 'jam' });
    expect(limiterSegment(c, 'disc')?.index).toBe(1);
  });

  it('finds none when the only piece between holds a loaded station', () => {
    const c = caseOf({ rpm: 300, segments: [[600, 40, 0]], stations: [['disc', 100, 1], ['jam', 500, 0]], stop: 'jam' });
    expect(limiterSegment(c, 'disc')).toBeUndefined();
  });

  it('puts the setting on that segment only and leaves the case it was given as it was', () => {
    const c = caseOf({ rpm: 300, segments: [[100, 40, 0], [400, 45, 0]], stations: [['disc', 100, 1], ['jam', 500, 0]], stop: 'jam' });
    const d = withLimiter(c, 1, 800);
    expect(d.shaft.segments.map((s) => s.slipTorque)).toEqual([undefined, 800]);
    expect(c.shaft.segments.every((s) => s.slipTorque === undefined)).toBe(true);
  });
});
