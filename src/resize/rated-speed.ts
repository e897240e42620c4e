import type { Case } from '../case/case.ts';

/** A part with a marked speed (abrasive or cutting wheel) against its speed at the incident. */
export interface RatedSpeedCheck {
  station: string;
  part: string;
  /** The part's own speed at the incident, rad/s (shaft speed × its speed ratio). */
  speed: number;
  /** The speed marked on it, rad/s. */
  ratedSpeed: number;
  /** Whether it ran above its marked speed. */
  over: boolean;
}

/**
 * Every part with a `rated_speed`, checked against the speed it ran at: a wheel is never run above
 * the speed marked on it (ANSI B7.1 Sec. 7.1.1; 29 CFR 1910.215(d)(1); see REFERENCE 11.1, 11.10).
 */
export function ratedSpeedChecks(c: Case): RatedSpeedCheck[] {
  return c.stations.flatMap((s) =>
    s.parts
      .filter((p) => p.ratedSpeed !== undefined)
      .map((p) => {
        const speed = c.speed * p.speedRatio;
        return { station: s.name, part: p.name, speed, ratedSpeed: p.ratedSpeed!, over: speed > p.ratedSpeed! * (1 + 1e-9) };
      }),
  );
}
