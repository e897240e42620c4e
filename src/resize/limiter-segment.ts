import type { Case, Segment } from '../case/case.ts';

/** Positions closer than this are the same point, m (as in src/model/shaft-model.ts). */
const EPS = 1e-9;

/** Where the limiter is modelled: a segment of a (possibly re-cut) copy of the case. */
export interface LimiterModelPlace {
  /** The case with the segment that holds the station cut there; nothing else changed. */
  case: Case;
  /** Index into `case.shaft.segments` of the piece that holds the limiter. */
  segment: number;
  /** The segment of the case as given that the piece is cut from. */
  original: Segment;
  /** The piece's ends, m: from the limiter's station (or the limiter the case has) toward the stop. */
  start: number;
  end: number;
  /** The case already has a limiter on that run: the option is that limiter at a new setting. */
  existing: boolean;
}

/**
 * Where a limiter said to sit at `station` is modelled: in the shaft right beside the station on
 * the stop's side, so the station's parts drive through it and every piece from there to the stop
 * is behind it. Where the station lies inside a segment, that segment is cut at the station (and at
 * the next loaded station or the stop, where one lies inside it), so the limiter sits at the station
 * and not in some other segment further along: the case reader refuses a limiter in a segment with
 * loaded stations inside it, since it would be unclear which side of the limiter their parts are
 * on. The pieces keep the segment's diameter, bore, material, kt and label. A segment that already
 * holds a limiter on the run from the station to the stop is taken as it is (the option is that
 * limiter at a new setting). Undefined where the piece beside the station holds a shear pin, or the
 * station is the stop.
 */
export function limiterPlace(c: Case, station: string): LimiterModelPlace | undefined {
  const stop = c.stations.find((s) => s.name === c.stop.at)!.at;
  const at = c.stations.find((s) => s.name === station)!.at;
  if (Math.abs(at - stop) <= EPS) return undefined;
  const lo = Math.min(at, stop);
  const hi = Math.max(at, stop);
  const existing = c.shaft.segments.find((g) => g.slipTorque !== undefined && g.end > lo + EPS && g.start < hi - EPS);
  if (existing) return { case: c, segment: existing.index, original: existing, start: existing.start, end: existing.end, existing: true };

  const toward = Math.sign(stop - at);
  const probe = at + toward * 1e-7;
  const seg = c.shaft.segments.find((g) => g.start <= probe && probe <= g.end);
  if (!seg || seg.shearTorque !== undefined) return undefined;
  // The piece ends at the segment's end toward the stop, or earlier at the stop or a loaded station inside it.
  const segEnd = toward > 0 ? seg.end : seg.start;
  const stopsInside = [stop, ...c.stations.filter((s) => s.parts.length > 0).map((s) => s.at)].filter((x) => x > seg.start + EPS && x < seg.end - EPS && (x - at) * toward > EPS);
  const far = stopsInside.reduce((best, x) => (Math.abs(x - at) < Math.abs(best - at) ? x : best), segEnd);
  const start = Math.min(at, far);
  const end = Math.max(at, far);
  const cuts = [seg.start, start, end, seg.end].filter((x, i, xs) => i === 0 || x > xs[i - 1] + EPS);
  const pieces: Segment[] = cuts.slice(0, -1).map((from, i) => ({ ...seg, start: from, end: cuts[i + 1] }));
  const segments = c.shaft.segments.flatMap((g) => (g === seg ? pieces : [g])).map((g, index) => ({ ...g, index }));
  const segment = segments.findIndex((g) => Math.abs(g.start - start) <= EPS && Math.abs(g.end - end) <= EPS);
  return { case: { ...c, shaft: { segments } }, segment, original: seg, start, end, existing: false };
}

/** A copy of the case with a friction limiter of slip torque `setting` in `segment`. The input is not changed. */
export function withLimiter(c: Case, segment: number, setting: number): Case {
  return { ...c, shaft: { segments: c.shaft.segments.map((s) => (s.index === segment ? { ...s, slipTorque: setting } : s)) } };
}
