import type { Case } from '../case/case.ts';
import type { Investigation } from '../finding/investigation.ts';
import type { Results } from '../results/results.ts';
import { runningTorque } from '../results/running-torque.ts';
import { combinedOptions } from './combined-options.ts';
import { criticalSegment } from './critical-segment.ts';
import { fuseOrder } from './fuse-order.ts';
import { designCheck, type DesignCheck } from './design-run.ts';
import { guardingRecommendations } from './guarding.ts';
import { keyFuses } from './key-fuse.ts';
import { otherMaterials } from './other-materials.ts';
import { ratedSpeedChecks } from './rated-speed.ts';
import type { ResizeResult } from './resize-result.ts';
import { runningCheck } from './running-check.ts';
import { scaleSide } from './scale-side.ts';
import { stiffnessChange } from './stiffness-change.ts';
import { STOCK_SERIES } from './stock-sizes.ts';
import { torqueLimiter } from './torque-limiter.ts';
import { withFlags } from './option-flags.ts';
import { PICK_RULE, recommendOption } from './recommend.ts';

export interface ResizeOptions {
  /** Design factor N on shear yield; default the case's analysis.design_factor. */
  factor?: number;
}

/**
 * The options for what goes back in, side by side: scale the governing side, resize its critical
 * segment, another material, a torque limiter, the key as a fuse; each checked by rerunning the
 * changed case through the engine against a repeat of the incident, and under the running torque;
 * each flagged where it is not advisable (src/resize/option-flags.ts) and one picked by the stated
 * rule (src/resize/recommend.ts, `PICK_RULE`). Where no option alone passes, the combined options
 * (src/resize/combined-options.ts) are made, flagged by the same rules, and the rule picks among
 * all of them.
 * Pure: `results` is analyseCase(c).
 */
export function resizeCase(c: Case, results: Investigation, options: ResizeOptions = {}): ResizeResult {
  const designFactor = options.factor ?? c.analysis.designFactor;
  if (!(designFactor >= 1)) throw new RangeError(`resizeCase: a design factor of 1 or more is needed, not ${designFactor}`);
  const { serviceFactor, maxScale } = c.analysis;
  const running = runningTorque(c);
  const side = results.governing.side.side;
  // The present case's modes from a chain cut as the options' are, for the frequency ratios.
  const presentModes = results.verdictBasis === 'dynamic model' ? designCheck(c) : results;
  const effects = (r: DesignCheck) => ({ running: runningCheck(r.case, running, designFactor), change: stiffnessChange(results, r, side, presentModes) });

  const scale = scaleSide(c, results, designFactor, maxScale);
  const critical = criticalSegment(c, results, designFactor);
  const limiter = torqueLimiter(c, results, running, designFactor, serviceFactor);
  const wheels = ratedSpeedChecks(c);
  const limited = { station: limiter.station, setting: limiter.max, sidePeakTorque: limiter.slip.unlimitedTorque };

  const materials = otherMaterials(c, designFactor);

  const singles = withFlags({
    results,
    designFactor,
    serviceFactor,
    maxScale,
    present: { running: runningCheck(c, running, designFactor) },
    scaleSide: { ...scale, ...effects(scale.stockRerun) },
    criticalSegment: { ...critical, ...(critical.stockRerun ? effects(critical.stockRerun) : {}) },
    materials: materials.map((m) => ({ ...m, ...effects(m.rerun) })),
    limiter: { ...limiter, running: runningCheck(c, running, designFactor), fuses: fuseOrder(c, c, results.finding, limiter.station, limiter.slip, designFactor) },
    keys: keyFuses(c, results, limited, running),
    combined: [],
    ratedSpeed: wheels,
    guarding: guardingRecommendations(c, wheels),
    stockSeries: STOCK_SERIES[c.units].text,
    notes: resizeNotes(results, limiter.slip.slipMethod === 'dynamic model', designFactor, STOCK_SERIES[c.units].text),
    cautions: results.cautions,
  });
  const single = recommendOption(singles);
  if (single) return { ...singles, recommended: single, pickRule: PICK_RULE };
  // No option alone passes: the combinations, flagged by the same rules (computed only here, for their cost).
  const flagged = withFlags({ ...singles, combined: combinedOptions({ c, results, running, designFactor, serviceFactor, limiter, materials }) });
  return { ...flagged, recommended: recommendOption(flagged), pickRule: PICK_RULE };
}

function resizeNotes(results: Results, dynamicSlip: boolean, designFactor: number, stockSeries: string): string[] {
  return [
    'Every option is checked against a repeat of the recorded incident by rerunning the changed case through the same elastic energy method; its limits (instantaneous stop, several stations on a side) apply to every option.',
    `The design factor N on shear yield is the engineer's choice (default 1.5, set by analysis.design_factor or --factor; here ${designFactor}); confirm it against the site's rules.`,
    `The service factor on the running torque (default 1.5) sets a torque limiter's lowest setting. Typical values come from the coupling or limiter maker's tables, which rate the driven machine's load (uniform, moderate shock, heavy shock) and the driver, from about 1 for uniform loads to 2 or more for heavy shock (from memory, verify against the maker's table).`,
    `Diameters are rounded up to stock sizes (${stockSeries}). The ratios shown for a scaled shaft or a resized segment are taken at the stock sizes, each bore scaled with its stock diameter (the bore ratio kept). A changed diameter means the bearings, hubs, keyways and fits must be rechecked.`,
    'A stiffer shaft passes more torque in an energy-limited stop (T = √(2E/C) and C falls as 1/d⁴, so T grows as d²): keys, hubs and couplings must be rechecked at the new peak torque.',
    results.verdictBasis === 'dynamic model'
      ? `The verdict stands on the dynamic model, so the natural-frequency changes are the ratio of the side's lowest natural frequency in the dynamic models of the option and of the present case${dynamicSlip ? ", and the limiter's slip energy, slip angle and peak torque come from the dynamic model with the limiter put into the case as a slip element (the report's sweep of settings stays the energy method's)" : "; the limiter's slip energy and angle stay the energy method's (see the limiter option for why)"}. Stiffness and peak-torque ratios are the energy method's.`
      : "Stiffness and natural-frequency changes are the energy method's single-mass estimate √(k/J), and the limiter's slip energy and angle are the energy method's: the energy method is exact for this case.",
  ];
}
