import { describe, expect, it } from 'vitest';
import { limiterPlace, withLimiter } from '../../src/resize/limiter-segment.ts';
import { caseOf } from '../helpers/layout.ts';

const ends = (c: ReturnType<typeof caseOf>) => c.shaft.segments.map((s) => [Math.round(s.start * 1000), Math.round(s.end * 1000)]);

describe('where a limiter placed at a station is modelled', () => {
  it("in the segment that holds the station, cut at the station, from there to the segment's end toward the stop", () => {
    const c = caseOf({
      rpm: 300,
      segments: [
        [100, 40, 0],
        [200, 45, 0],
        [300, 50, 0],
      ],
      stations: [
        ['disc', 50, 1],
        ['jam', 600, 0],
      ],
      stop: 'jam',
    });
    const p = limiterPlace(c, 'disc')!;
    expect(p.original.index).toBe(0);
    expect(ends(p.case)).toEqual([
      [0, 50],
      [50, 100],
      [100, 300],
      [300, 600],
    ]);
    expect(p.segment).toBe(1);
    expect([p.start, p.end].map((x) => Math.round(x * 1000))).toEqual([50, 100]);
    // The cut pieces keep the segment's diameter, and the indices run on.
    expect(p.case.shaft.segments.map((s) => s.diameter * 1000)).toEqual([40, 40, 45, 50]);
    expect(p.case.shaft.segments.map((s) => s.index)).toEqual([0, 1, 2, 3]);
    expect(p.existing).toBe(false);
  });

  it('works on either side of the stop', () => {
    const c = caseOf({
      rpm: 300,
      segments: [
        [300, 50, 0],
        [200, 45, 0],
        [100, 40, 0],
      ],
      stations: [
        ['jam', 0, 0],
        ['disc', 550, 1],
      ],
      stop: 'jam',
    });
    const p = limiterPlace(c, 'disc')!;
    expect(ends(p.case)).toEqual([
      [0, 300],
      [300, 500],
      [500, 550],
      [550, 600],
    ]);
    expect(p.segment).toBe(2);
  });

  it('takes the segment starting at the station when the station sits on a segment end, uncut', () => {
    const c = caseOf({
      rpm: 300,
      segments: [
        [100, 40, 0],
        [400, 45, 0],
      ],
      stations: [
        ['disc', 100, 1],
        ['jam', 500, 0],
      ],
      stop: 'jam',
    });
    const p = limiterPlace(c, 'disc')!;
    expect(ends(p.case)).toEqual([
      [0, 100],
      [100, 500],
    ]);
    expect(p.segment).toBe(1);
  });

  it('ends the piece at the stop or a loaded station inside the segment, so no loaded station lies inside it', () => {
    const c = caseOf({
      rpm: 300,
      segments: [[600, 40, 0]],
      stations: [
        ['disc', 100, 1],
        ['hub', 300, 1],
        ['jam', 500, 0],
      ],
      stop: 'jam',
    });
    const p = limiterPlace(c, 'disc')!;
    expect(ends(p.case)).toEqual([
      [0, 100],
      [100, 300],
      [300, 600],
    ]);
    expect(p.segment).toBe(1);
    const q = limiterPlace(c, 'hub')!;
    expect(ends(q.case)).toEqual([
      [0, 300],
      [300, 500],
      [500, 600],
    ]);
  });

  it('finds none where the shaft beside the station holds a shear pin, and takes a limiter the case has on the run as it is', () => {
    const pin = caseOf({
      rpm: 300,
      segments: [[600, 40, 0]],
      stations: [
        ['disc', 100, 1],
        ['jam', 500, 0],
      ],
      stop: 'jam',
    });
    const pinned = { ...pin, shaft: { segments: pin.shaft.segments.map((s) => ({ ...s, shearTorque: 500 })) } };
    expect(limiterPlace(pinned, 'disc')).toBeUndefined();
    const c = caseOf({
      rpm: 300,
      segments: [
        [100, 40, 0],
        [200, 45, 0],
        [300, 50, 0],
      ],
      stations: [
        ['disc', 50, 1],
        ['jam', 600, 0],
      ],
      stop: 'jam',
    });
    const limited = { ...c, shaft: { segments: c.shaft.segments.map((s) => (s.index === 2 ? { ...s, slipTorque: 900 } : s)) } };
    const p = limiterPlace(limited, 'disc')!;
    expect(p.existing).toBe(true);
    expect(p.segment).toBe(2);
    expect(p.case).toBe(limited);
  });

  it('puts the setting on that segment only and leaves the case it was given as it was', () => {
    const c = caseOf({
      rpm: 300,
      segments: [
        [100, 40, 0],
        [400, 45, 0],
      ],
      stations: [
        ['disc', 100, 1],
        ['jam', 500, 0],
      ],
      stop: 'jam',
    });
    const d = withLimiter(c, 1, 800);
    expect(d.shaft.segments.map((s) => s.slipTorque)).toEqual([undefined, 800]);
    expect(c.shaft.segments.every((s) => s.slipTorque === undefined)).toBe(true);
    const cut = limiterPlace(
      caseOf({
        rpm: 300,
        segments: [[600, 40, 0]],
        stations: [
          ['disc', 100, 1],
          ['jam', 500, 0],
        ],
        stop: 'jam',
      }),
      'disc',
    )!;
    expect(withLimiter(cut.case, cut.segment, 800).shaft.segments.map((s) => s.slipTorque)).toEqual([undefined, 800, undefined]);
  });
});
