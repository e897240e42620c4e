import type { Case, Segment } from '../case/case.ts';

/**
 * The shaft segment that holds a limiter placed at `station`: the segment nearest the station that
 * lies (at least in part) between the station and the stop, holds no station with parts strictly
 * inside it (the case reader refuses a limiter there, since it would be unclear which side of the
 * limiter those parts are on) and no shear pin. A segment that already holds a limiter on that run
 * is taken first: the option is that limiter at a new setting. Undefined when no segment fits.
 */
export function limiterSegment(c: Case, station: string): Segment | undefined {
  const stop = c.stations.find((s) => s.name === c.stop.at)!.at;
  const at = c.stations.find((s) => s.name === station)!.at;
  const lo = Math.min(at, stop);
  const hi = Math.max(at, stop);
  const eps = 1e-9;
  const strictlyInside = (seg: Segment, x: number) => x > seg.start + eps && x < seg.end - eps;
  const fits = (seg: Segment) =>
    seg.end > lo + eps &&
    seg.start < hi - eps &&
    seg.shearTorque === undefined &&
    !strictlyInside(seg, stop) &&
    !c.stations.some((s) => s.parts.length > 0 && strictlyInside(seg, s.at));
  const candidates = c.shaft.segments.filter(fits);
  // Gap from the station to the nearest point of the segment.
  const distance = (seg: Segment) => Math.max(0, seg.start - at, at - seg.end);
  const byNearness = [...candidates].sort((a, b) => distance(a) - distance(b));
  return byNearness.find((s) => s.slipTorque !== undefined) ?? byNearness[0];
}

/** A copy of the case with a friction limiter of slip torque `setting` in `segment`. The input is not changed. */
export function withLimiter(c: Case, segment: number, setting: number): Case {
  return { ...c, shaft: { segments: c.shaft.segments.map((s) => (s.index === segment ? { ...s, slipTorque: setting } : s)) } };
}
