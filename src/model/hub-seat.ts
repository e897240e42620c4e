import type { Segment } from '../case/case.ts';

/**
 * The segment a station's hub sits on. A station on a shoulder (the boundary of two segments) is
 * taken on the segment toward the stop, the way its torque goes; at the stop itself, on the
 * segment that starts there (or the last one).
 */
export function seatSegment(segments: readonly Segment[], at: number, stopAt: number): Segment {
  const probe = at + (Math.sign(stopAt - at) || 1) * 1e-7;
  return segments.find((g) => g.start <= probe && probe <= g.end) ?? segments[segments.length - 1];
}
