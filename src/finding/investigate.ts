import type { Case } from '../case/case.ts';
import type { Metrics } from '../uncertainty/monte-carlo.ts';
import { sampleEngine } from '../uncertainty/sample-engine.ts';
import { runDynamicUncertainty, runUncertainty } from '../uncertainty/uncertainty.ts';
import { judgeByInterval } from '../results/twist-findings.ts';
import { analyseCase } from '../results/analyse-case.ts';
import { dynamicPeakMetrics } from '../results/dynamic-result.ts';
import { buildShaftModel } from '../model/shaft-model.ts';
import { withInputWarnings, type InputWarnings } from '../results/input-warnings.ts';
import type { Results } from '../results/results.ts';
import { withFinding, type Investigation } from './investigation.ts';

/** Overrides from the command line. */
export interface InvestigateOptions {
  /** Monte Carlo samples; 0 switches the uncertainty run off. */
  samples?: number;
  seed?: number;
  /** Called after each dynamic-model sample, so a terminal can show progress (the core keeps no clock). */
  onDynamicProgress?: (done: number, total: number) => void;
  /** The case file's plausibility warnings, carried into the results' warnings. */
  inputWarnings?: InputWarnings;
  /** false: no twist read-back (a view that shows no observations, such as the resize table). */
  readBack?: boolean;
}

/** The numbers one Monte Carlo sample keeps, read from a full run (the sampling engine must agree with it). */
export function metricsOf(r: Results): Metrics {
  return {
    yieldRatio: r.yieldRatio,
    maxShearStress: r.maxShearStress,
    peakTorque: r.plastic.peakTorque,
    permanentTwist: Math.max(...r.plastic.sides.map((s) => s.permanentTwist)),
    speedsForMeasured: r.observedFindings.twist.map((f) => (f.predicted === 0 && f.speedForMeasured === undefined ? undefined : f.speedForMeasured)),
  };
}

/**
 * A dynamic-model sample: the verdict's yield ratio, the dynamic peak torque and stress; `elements`
 * fixes the dynamic model's element count (the base run's, so a sample pays for no refinement).
 */
export function dynamicMetrics(k: Case, elements?: number): Metrics {
  const c = elements === undefined ? k : { ...k, analysis: { ...k.analysis, elements } };
  // The verdict stands on the dynamic model for every sample: which model it takes depends on the
  // case's parts (drives, slips, stations, a ramp), not on the values drawn.
  return dynamicPeakMetrics(c, buildShaftModel(c));
}

/**
 * The whole investigation of a case: the single run, where the case states tolerances how sure
 * its finding is, and the finding decided from both. Pure.
 */
export function investigate(c: Case, opts: InvestigateOptions = {}): Investigation {
  const results = withInputWarnings(analyseCase(c, { readBack: opts.readBack }), opts.inputWarnings);
  const u = c.analysis.uncertainty;
  const samples = opts.samples ?? u.samples;
  if (!u.wanted || samples === 0) return withFinding(results);
  const settings = { samples, seed: opts.seed ?? u.seed, strengthScatter: u.strengthScatter };
  // Where the twist read-back stands on the dynamic model, the sampler's own read-back is not shown (below): not sought.
  const engine = sampleEngine(results.pastYieldBasis !== 'dynamic model');
  const uncertainty = runUncertainty(c, engine, settings);
  if (results.verdictBasis === 'dynamic model' && u.dynamicSamples > 0) {
    const elements = results.dynamic.elementTarget;
    const dynamicEngine = (k: Case) => dynamicMetrics(k, elements);
    uncertainty.dynamic = runDynamicUncertainty(c, dynamicEngine, { ...settings, samples: u.dynamicSamples }, uncertainty.yieldRatioSamples, opts.onDynamicProgress);
  }
  if (results.pastYieldBasis === 'dynamic model' && uncertainty.observed.length > 0) {
    // The sampler runs the energy balance; its speeds behind a measured twist are not the dynamic
    // model's read-back, so they are left out rather than shown beside it.
    uncertainty.observed = [];
    const warnings = [
      ...results.warnings,
      'The uncertainty run samples the energy balance, not the dynamic model the twist read-back stands on, so each measured twist is judged against the band on the recorded speed and its own tolerance, not by a Monte Carlo interval.',
    ];
    return withFinding({ ...results, uncertainty, warnings });
  }
  const twist = results.observedFindings.twist.map((f, k) => judgeByInterval(f, uncertainty.observed[k]?.speedInterval ?? null));
  return withFinding({ ...results, uncertainty, observedFindings: { ...results.observedFindings, twist } });
}
