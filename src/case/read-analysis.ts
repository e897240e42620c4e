import type { CaseReader } from './case-reader.ts';
import { ANALYSIS_SHAPE, keysOf } from './case-shape.ts';
import { MAX_ELEMENTS, NUMBER_LIMITS } from './limits.ts';
import { DEFAULT_DAMPING_RATIO, DEFAULT_DYNAMIC_PLASTICITY, type Analysis, type Hardening, type Station, type YieldCriterion } from './case.ts';

const ANALYSIS_KEYS = keysOf(ANALYSIS_SHAPE);
/** A coefficient of variation of strengths: at most 30 %, beyond which a normal spread of a strength is no model. */
const SCATTER_LIMIT = { min: 1e-6, max: 0.3, text: '0.0001 % to 30 %' };
/** The dynamic model's window: at most 10 s simulated (with at most MAX_STEPS steps, src/results/dynamic-solve.ts). */
export const DURATION_LIMIT = { min: 1e-5, max: 10, text: '0.01 ms to 10 s' };

export { MAX_ELEMENTS };
const CRITERIA: YieldCriterion[] = ['distortion-energy', 'max-shear'];
const HARDENING: Hardening[] = ['none', 'linear'];

/** Default coefficient of variation of strengths: a stated assumption (see README, "How sure"). */
export const DEFAULT_STRENGTH_SCATTER = 0.07;

/** Default samples through the dynamic model: about 2–4 s on a 2-core machine for the sample cases. */
export const DEFAULT_DYNAMIC_SAMPLES = 40;

/** Defaults of the engineer's choices; each is stated in the resize output as a choice to confirm. */
export const ANALYSIS_DEFAULTS = { designFactor: 1.5, serviceFactor: 1.5, maxScale: 1.3 } as const;

/**
 * The `analysis:` section: the yield criterion, hardening past yield, the dynamic model's settings,
 * the Monte Carlo settings and the factors the resize options use. Read after every other section, so `r.tolerances` is complete.
 */
export function readAnalysis(r: CaseReader, stations: readonly Station[], stopAt: string | undefined): Analysis {
  r.map(['analysis'], ANALYSIS_KEYS);
  const criterion = (r.string(['analysis', 'criterion'], { allowed: CRITERIA }) ?? 'distortion-energy') as YieldCriterion;
  const hardening = (r.string(['analysis', 'hardening'], { allowed: HARDENING }) ?? 'none') as Hardening;
  const [sMin, sMax] = NUMBER_LIMITS.samples;
  const samples = r.number(['analysis', 'samples'], { example: `a whole number from ${sMin} to ${sMax}, such as 10000`, integer: true, min: sMin, max: sMax }) ?? 10_000;
  const [dMin, dMax] = NUMBER_LIMITS.dynamicSamples;
  const dynamicSamples =
    r.number(['analysis', 'dynamic_samples'], { example: `a whole number from ${dMin} to ${dMax}, such as 40, or 0 for none`, integer: true, min: dMin, max: dMax }) ?? DEFAULT_DYNAMIC_SAMPLES;
  const seed = r.number(['analysis', 'seed'], { example: 'a whole number from 0 to 4294967295, such as 42', integer: true, min: NUMBER_LIMITS.seed[0], max: NUMBER_LIMITS.seed[1] }) ?? 1;
  const scatter = r.quantity(['analysis', 'strength_scatter'], 'fraction', { nonNegative: true, limit: SCATTER_LIMIT, example: 'a coefficient of variation such as "7 %"' });
  const wanted = scatter !== undefined || Object.keys(r.tolerances).length > 0;
  const elements = r.number(['analysis', 'elements'], {
    example: `a whole number of shaft elements from 1 to ${MAX_ELEMENTS}, such as 40, or leave it out to refine automatically`,
    integer: true,
    positive: true,
  });
  if (elements !== undefined && elements > MAX_ELEMENTS) {
    r.fail('E_RANGE', ['analysis', 'elements'], `${elements} is more than ${MAX_ELEMENTS}; give a number such as 40, or leave it out to refine automatically`);
  }
  const shaftInertia = r.boolean(['analysis', 'shaft_inertia']) ?? true;
  const dynamicPlasticity = r.boolean(['analysis', 'dynamic_plasticity']) ?? DEFAULT_DYNAMIC_PLASTICITY;
  const damping = r.quantity(['analysis', 'damping_ratio'], 'fraction', {
    nonNegative: true,
    limit: { min: 1e-6, max: 1e3, text: '0.0001 % up' }, // 1 and more: the message below
    example: 'a damping ratio such as 0.02 or "2 %"',
  });
  if (damping && damping.value >= 1) {
    r.fail('E_RANGE', ['analysis', 'damping_ratio'], `${damping.value} is not below 1 (critical damping); give a ratio such as 0.02 or "2 %"`);
  }
  const duration = r.quantity(['analysis', 'duration'], 'time', {
    positive: true,
    limit: DURATION_LIMIT,
    example: 'the time to simulate from the stop, such as "0.5 s" or "300 ms"',
  });
  const factor = (key: string, example: string) => r.number(['analysis', key], { example, min: NUMBER_LIMITS.factor[0], max: NUMBER_LIMITS.factor[1] });
  const analysis: Analysis = {
    criterion,
    hardening,
    shaftInertia,
    dynamicPlasticity,
    dampingRatio: damping && damping.value < 1 ? damping.value : DEFAULT_DAMPING_RATIO,
    uncertainty: { wanted, samples, seed, strengthScatter: scatter?.value ?? DEFAULT_STRENGTH_SCATTER, dynamicSamples },
    designFactor: factor('design_factor', 'a design factor of 1 or more (at most 10), such as 1.5') ?? ANALYSIS_DEFAULTS.designFactor,
    serviceFactor: factor('service_factor', 'a service factor of 1 or more (at most 10), such as 1.5') ?? ANALYSIS_DEFAULTS.serviceFactor,
    maxScale: factor('max_scale', 'the largest practical scale of the diameters, from 1 to 10, such as 1.3') ?? ANALYSIS_DEFAULTS.maxScale,
  };
  if (elements !== undefined && elements <= MAX_ELEMENTS) analysis.elements = elements;
  if (duration) analysis.duration = duration.value;
  const limiterAt = r.string(['analysis', 'limiter_at']);
  if (limiterAt !== undefined) {
    const names = stations.map((s) => s.name);
    if (!names.includes(limiterAt)) {
      r.fail('E_REFERENCE', ['analysis', 'limiter_at'], `no station is named "${limiterAt}"; give the station where a torque limiter would sit, one of ${names.map((n) => `"${n}"`).join(', ')}`);
    } else if (limiterAt === stopAt) {
      r.fail(
        'E_RANGE',
        ['analysis', 'limiter_at'],
        `"${limiterAt}" is the station that stopped; a torque limiter sits between the driving parts and the stop, such as at ${names
          .filter((n) => n !== stopAt)
          .map((n) => `"${n}"`)
          .join(' or ')}`,
      );
    } else if (!drivesThrough(stations, limiterAt, stopAt)) {
      r.fail(
        'E_RANGE',
        ['analysis', 'limiter_at'],
        `a torque limiter at "${limiterAt}" would carry no torque: no station at or beyond it, on its side of the stop, carries parts; give a station between the driving parts and the stop`,
      );
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
