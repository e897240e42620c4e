import type { Case, Segment, Station } from '../case/case.ts';

/** A stretch of one segment between neighbouring station positions (or the segment's ends). */
export interface ShaftPiece {
  segment: Segment;
  /** Positions, m; start < end. */
  start: number;
  end: number;
}

export type SideName = 'A' | 'B';

/**
 * One side of the stop: side A lies toward the shaft's start, side B toward its end. Only sides
 * with rotating parts are modelled.
 */
export interface Side {
  side: SideName;
  /** Stations on this side that carry parts, nearest the stop first. */
  stations: Station[];
  /** The shaft between the stop and the farthest loaded station, nearest the stop first. */
  pieces: ShaftPiece[];
}

export interface ShaftModel {
  stop: Station;
  sides: Side[];
  /** Stations at the stop's position other than the stop itself: their parts release nothing into the shaft. */
  atStop: Station[];
}

/** Positions closer than this are the same point, m (sums of segment lengths carry rounding). */
const EPS = 1e-9;

/** Segments cut at every station position, in order along the shaft. */
export function cutAtStations(segments: readonly Segment[], stations: readonly Station[]): ShaftPiece[] {
  const cuts = [...new Set(stations.map((s) => s.at))].sort((a, b) => a - b);
  const pieces: ShaftPiece[] = [];
  for (const segment of segments) {
    let start = segment.start;
    for (const c of cuts) {
      if (c > start + EPS && c < segment.end - EPS) {
        pieces.push({ segment, start, end: c });
        start = c;
      }
    }
    pieces.push({ segment, start, end: segment.end });
  }
  return pieces;
}

/**
 * Splits the shaft at the stop into its sides. The run of shaft that takes a side's energy goes from
 * the stop to the farthest station on that side that carries parts; shaft beyond carries no torque.
 */
export function buildShaftModel(c: Case): ShaftModel {
  const stop = c.stations.find((s) => s.name === c.stop.at)!;
  const pieces = cutAtStations(c.shaft.segments, c.stations);
  const loaded = c.stations.filter((s) => s !== stop && s.parts.length > 0);
  const atStop = loaded.filter((s) => Math.abs(s.at - stop.at) <= EPS);
  const sides: Side[] = [];

  const a = loaded.filter((s) => s.at < stop.at - EPS).sort((x, y) => y.at - x.at);
  if (a.length > 0) {
    const far = a[a.length - 1].at;
    sides.push({ side: 'A', stations: a, pieces: pieces.filter((p) => p.start >= far - EPS && p.end <= stop.at + EPS).reverse() });
  }
  const b = loaded.filter((s) => s.at > stop.at + EPS).sort((x, y) => x.at - y.at);
  if (b.length > 0) {
    const far = b[b.length - 1].at;
    sides.push({ side: 'B', stations: b, pieces: pieces.filter((p) => p.start >= stop.at - EPS && p.end <= far + EPS) });
  }
  return { stop, sides, atStop };
}
