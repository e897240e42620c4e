import type { Case, Segment, ShaftKey } from '../case/case.ts';

/**
 * The segment a station's hub sits on. A station on a shoulder (the boundary of two segments) is
 * taken on the segment toward the stop, the way its torque goes; at the stop itself, on the
 * segment that starts there (or the last one).
 */
export function seatSegment(segments: readonly Segment[], at: number, stopAt: number): Segment {
  const probe = at + (Math.sign(stopAt - at) || 1) * 1e-7;
  return segments.find((g) => g.start <= probe && probe <= g.end) ?? segments[segments.length - 1];
}

/**
 * The keys seated on a piece of shaft: each station with a key at either end of the piece whose
 * seat (`seatSegment`) is the piece's segment. A hub stands over its station, so its keyseat runs
 * into the piece on each side that lies on the seat's segment.
 */
export function keysOnPiece(c: Case, piece: { segment: Segment; start: number; end: number }): ShaftKey[] {
  const stopAt = c.stations.find((s) => s.name === c.stop.at)?.at ?? 0;
  return c.stations.flatMap((s) =>
    s.key && (Math.abs(s.at - piece.start) <= 1e-9 || Math.abs(s.at - piece.end) <= 1e-9) && seatSegment(c.shaft.segments, s.at, stopAt).index === piece.segment.index ? [s.key] : [],
  );
}
