import type { Case } from '../case/case.ts';
import type { Metrics } from '../uncertainty/monte-carlo.ts';
import { runUncertainty } from '../uncertainty/uncertainty.ts';
import { analyseCase } from './analyse-case.ts';
import type { Results } from './results.ts';

/** Overrides from the command line. */
export interface InvestigateOptions {
  /** Monte Carlo samples; 0 switches the uncertainty run off. */
  samples?: number;
  seed?: number;
}

/** The numbers one Monte Carlo sample keeps, from the same engine as the single run. */
export function metricsOf(r: Results): Metrics {
  return {
    yieldRatio: r.yieldRatio,
    maxShearStress: r.maxShearStress,
    peakTorque: Math.max(...r.sides.map((s) => s.peakTorque)),
  };
}

/**
 * The whole investigation of a case: the single run, and where the case states tolerances, how
 * sure its finding is. Pure.
 */
export function investigate(c: Case, opts: InvestigateOptions = {}): Results {
  const results = analyseCase(c);
  const u = c.analysis.uncertainty;
  const samples = opts.samples ?? u.samples;
  if (!u.wanted || samples === 0) return results;
  const uncertainty = runUncertainty(c, (k) => metricsOf(analyseCase(k)), { samples, seed: opts.seed ?? u.seed, strengthScatter: u.strengthScatter });
  return { ...results, uncertainty };
}
