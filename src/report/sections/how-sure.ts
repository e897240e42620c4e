import type { Results } from '../../results/results.ts';
import type { Uncertainty } from '../../uncertainty/uncertainty.ts';
import { show, sig } from '../../views/display-units.ts';
import { chanceOfYieldWords, sensitivityFinding } from '../../views/uncertainty-summary.ts';
import { chanceSentence } from '../../views/finding-words.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';
import { markdownTable } from '../tables/report-table.ts';
import { uncertaintyInputsTable } from '../tables/uncertainty-inputs-table.ts';
import { uncertaintyPercentilesTable } from '../tables/uncertainty-percentiles-table.ts';
import { uncertaintySensitivityTable } from '../tables/uncertainty-sensitivity-table.ts';

/**
 * How sure the finding is, from `results.uncertainty` (present when the case states tolerances):
 * how the inputs were drawn, the ranges, the chance of yield, the speeds behind each measured
 * twist and which input matters most. Left out when there was no uncertainty run.
 */
export const howSureSection: ReportSection = {
  id: 'uncertainty',
  title: 'How sure the finding is',
  render({ results: r }) {
    const u = r.uncertainty;
    if (!u) return undefined;
    const [y5, y50, y95] = u.percentiles.yieldRatio;
    const out = [
      escapeMarkdown(
        `The case states tolerances, so the investigation was repeated ${u.samples} times (a seeded Monte Carlo, seed ${u.seed}) through the same engine as the single run, each time with every varied input drawn from its distribution below. The same seed gives the same numbers; the seed is recorded in results.json.`,
      ),
      '**How the inputs are drawn**',
      bulletList(distributionWords(u).map(escapeMarkdown)),
      markdownTable(uncertaintyInputsTable(r)!),
      ...(u.notVaried.length > 0 ? [escapeMarkdown(`Stated tolerances the Monte Carlo does not vary (lengths and positions): ${u.notVaried.join(', ')}.`)] : []),
      '**The ranges**',
      markdownTable(uncertaintyPercentilesTable(r)!),
      ...(chanceSentence(r.finding) ? [`**${escapeMarkdown(chanceSentence(r.finding)!)}**`] : []),
      ...(u.dynamic
        ? [
            `**Through the dynamic model (the finding's model):** ${escapeMarkdown(
              `the same inputs were drawn ${u.dynamic.samples} times (same seed; analysis.dynamic_samples) through the dynamic model. Its stress / shear yield has a median of ${sig(u.dynamic.percentiles.yieldRatio[1])}, 90 % of the runs between ${sig(u.dynamic.percentiles.yieldRatio[0])} and ${sig(u.dynamic.percentiles.yieldRatio[2])}. For comparison, through the energy method (${u.samples} samples): ${chanceOfYieldWords(u).toLowerCase()}; median ${sig(y50)}, 90 % between ${sig(y5)} and ${sig(y95)}, single run ${sig(r.yieldRatio)}.`,
            )}`,
          ]
        : [
            `**Through the energy method (the finding's model):** ${escapeMarkdown(`${chanceOfYieldWords(u)}. The single run gives stress / shear yield ${sig(r.yieldRatio)}; over the tolerances the median is ${sig(y50)} and 90 % of the samples lie between ${sig(y5)} and ${sig(y95)}.`)}`,
          ]),
      ...observedWords(r, u),
    ];
    if (u.sensitivity.length > 0) {
      out.push('**Which input matters most**', markdownTable(uncertaintySensitivityTable(r)!));
      out.push(escapeMarkdown("Each input is swung to the ends of its band (±2σ) with the others held at the single run's values."));
      const finding = sensitivityFinding(r)!;
      out.push(`**${escapeMarkdown(finding[0].toUpperCase() + finding.slice(1))}**`);
    }
    return out.join('\n\n');
  },
};

/** The distributions used, in words, for the kinds of input this run varies (README, "How sure the finding is"). */
function distributionWords(u: Uncertainty): string[] {
  const used = new Set(u.inputs.map((i) => i.basis));
  const cov = `${sig(100 * u.strengthScatter)} %`;
  const out: string[] = [];
  if (used.has('band'))
    out.push('A stated ± band is taken as two standard deviations of a normal distribution: a careful measurement or log reading falls inside its stated band about 95 % of the time.');
  if (used.has('minimum'))
    out.push(
      `A handbook minimum strength is taken as the 5th percentile of a normal distribution with a coefficient of variation of ${cov} (analysis.strength_scatter): the real bar is probably stronger.`,
    );
  if (used.has('typical'))
    out.push(`A typical strength (or a case material's, unless it says strength_basis: minimum) is taken as the mean of a normal distribution with a coefficient of variation of ${cov}.`);
  if (u.strengthScatter === 0) out.push('Material strengths are not varied (analysis.strength_scatter is 0 %).');
  return out;
}

/** The interval of speeds at the stop behind each measured twist, against the recorded speed. */
function observedWords(r: Results, u: Uncertainty): string[] {
  if (u.observed.length === 0) return [];
  const units = r.case.units;
  const recorded = show(r.speed, 'speed', units, 4);
  const lines = u.observed.map((o, k) => {
    const [a, b] = o.between;
    const f = r.observedFindings.twist[k];
    if (o.speedInterval) {
      const [lo, hi] = o.speedInterval;
      const some = o.unexplainedShare > 0 ? ` In ${sig(100 * o.unexplainedShare, 2)} % of the samples no speed explains it.` : '';
      return `Twist between "${a}" and "${b}": a stop from ${show(lo, 'speed', units, 4)} to ${show(hi, 'speed', units, 4)} (5–95 %) explains it; the recorded ${recorded} lies ${o.recordedInside ? 'inside' : 'outside'} that interval.${some}`;
    }
    if (f && f.measurement.angle === 0 && !Number.isFinite(f.yieldOnsetSpeed)) {
      return `Twist between "${a}" and "${b}": none was measured, and the shaft between these stations does not yield at any speed, so the measurement does not bound the speed.`;
    }
    return `Twist between "${a}" and "${b}": no speed at the stop explains it in any sample.`;
  });
  return ['**The measured twist against the recorded speed**', bulletList(lines.map(escapeMarkdown))];
}
