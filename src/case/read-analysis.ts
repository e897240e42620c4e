import type { CaseReader } from './case-reader.ts';
import type { Analysis, Station, YieldCriterion } from './case.ts';

const ANALYSIS_KEYS = ['criterion', 'design_factor', 'service_factor', 'max_scale', 'limiter_at'];
const CRITERIA: YieldCriterion[] = ['distortion-energy', 'max-shear'];

/** Defaults of the engineer's choices; each is stated in the resize output as a choice to confirm. */
export const ANALYSIS_DEFAULTS = { designFactor: 1.5, serviceFactor: 1.5, maxScale: 1.3 } as const;

/** The `analysis:` section: the yield criterion and the factors the resize options use. */
export function readAnalysis(r: CaseReader, stations: readonly Station[], stopAt: string | undefined): Analysis {
  r.map(['analysis'], ANALYSIS_KEYS);
  const criterion = (r.string(['analysis', 'criterion'], { allowed: CRITERIA }) ?? 'distortion-energy') as YieldCriterion;
  const factor = (key: string, example: string) => r.number(['analysis', key], { example, min: 1 });
  const analysis: Analysis = {
    criterion,
    designFactor: factor('design_factor', 'a design factor of 1 or more, such as 1.5') ?? ANALYSIS_DEFAULTS.designFactor,
    serviceFactor: factor('service_factor', 'a service factor of 1 or more, such as 1.5') ?? ANALYSIS_DEFAULTS.serviceFactor,
    maxScale: factor('max_scale', 'the largest practical scale of the diameters, such as 1.3') ?? ANALYSIS_DEFAULTS.maxScale,
  };
  const limiterAt = r.string(['analysis', 'limiter_at']);
  if (limiterAt !== undefined) {
    const names = stations.map((s) => s.name);
    if (!names.includes(limiterAt)) {
      r.fail('E_REFERENCE', ['analysis', 'limiter_at'], `no station is named "${limiterAt}"; give the station where a torque limiter would sit, one of ${names.map((n) => `"${n}"`).join(', ')}`);
    } else if (limiterAt === stopAt) {
      r.fail('E_RANGE', ['analysis', 'limiter_at'], `"${limiterAt}" is the station that stopped; a torque limiter sits between the driving parts and the stop, such as at ${names.filter((n) => n !== stopAt).map((n) => `"${n}"`).join(' or ')}`);
    } else if (!drivesThrough(stations, limiterAt, stopAt)) {
      r.fail('E_RANGE', ['analysis', 'limiter_at'], `a torque limiter at "${limiterAt}" would carry no torque: no station at or beyond it, on its side of the stop, carries parts; give a station between the driving parts and the stop`);
    } else {
      analysis.limiterAt = limiterAt;
    }
  }
  return analysis;
}

/** Whether parts at or beyond `name` (away from the stop) drive the shaft through that station. */
function drivesThrough(stations: readonly Station[], name: string, stopAt: string | undefined): boolean {
  const stop = stations.find((s) => s.name === stopAt);
  const at = stations.find((s) => s.name === name)!;
  if (!stop) return true; // the stop's own problem is reported elsewhere
  const dir = Math.sign(at.at - stop.at);
  if (dir === 0) return false;
  return stations.some((s) => s.parts.length > 0 && (s.at - stop.at) * dir >= (at.at - stop.at) * dir - 1e-9);
}
