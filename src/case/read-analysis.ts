import type { CaseReader } from './case-reader.ts';
import { DEFAULT_DAMPING_RATIO, type Analysis, type YieldCriterion } from './case.ts';

const ANALYSIS_KEYS = ['criterion', 'elements', 'shaft_inertia', 'damping_ratio', 'duration'];
const CRITERIA: YieldCriterion[] = ['distortion-energy', 'max-shear'];
/** More elements than this buy nothing a case file can measure and make `check` slow. */
export const MAX_ELEMENTS = 2000;

/** The `analysis:` section: the yield criterion and the dynamic model's settings. */
export function readAnalysis(r: CaseReader): Analysis {
  r.map(['analysis'], ANALYSIS_KEYS);
  const criterion = (r.string(['analysis', 'criterion'], { allowed: CRITERIA }) ?? 'distortion-energy') as YieldCriterion;
  const elements = r.number(['analysis', 'elements'], {
    example: `a whole number of shaft elements from 1 to ${MAX_ELEMENTS}, such as 40, or leave it out to refine automatically`,
    integer: true,
    positive: true,
  });
  if (elements !== undefined && elements > MAX_ELEMENTS) {
    r.fail('E_RANGE', ['analysis', 'elements'], `${elements} is more than ${MAX_ELEMENTS}; give a number such as 40, or leave it out to refine automatically`);
  }
  const shaftInertia = r.boolean(['analysis', 'shaft_inertia']) ?? true;
  const damping = r.quantity(['analysis', 'damping_ratio'], 'fraction', {
    nonNegative: true,
    example: 'a damping ratio such as 0.02 or "2 %"',
  });
  if (damping && damping.value >= 1) {
    r.fail('E_RANGE', ['analysis', 'damping_ratio'], `${damping.value} is not below 1 (critical damping); give a ratio such as 0.02 or "2 %"`);
  }
  const duration = r.quantity(['analysis', 'duration'], 'time', {
    positive: true,
    example: 'the time to simulate from the stop, such as "0.5 s" or "300 ms"',
  });
  const analysis: Analysis = { criterion, shaftInertia, dampingRatio: damping && damping.value < 1 ? damping.value : DEFAULT_DAMPING_RATIO };
  if (elements !== undefined && elements <= MAX_ELEMENTS) analysis.elements = elements;
  if (duration) analysis.duration = duration.value;
  return analysis;
}
