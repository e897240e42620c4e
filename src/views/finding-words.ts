import { weakestSentence } from './drive-train-table.ts';
import type { Finding, FindingVerdict } from '../finding/finding.ts';
import type { Results } from '../results/results.ts';
import { show, sig } from './display-units.ts';
import { describePlasticPiece } from './piece-span.ts';

type Units = Results['case']['units'];
type Text = (s: string) => string;
const plain: Text = (s) => s;

/** The verdict's word, as every view prints it. */
export function verdictWord(f: Pick<Finding, 'verdict' | 'brittle'>): string {
  if (f.brittle && f.verdict === 'yielded locally') return 'OVER ITS STRENGTH AT A STRESS RAISER';
  const words: Record<FindingVerdict, string> = {
    elastic: 'ELASTIC',
    'yielded locally': 'YIELDED LOCALLY AT A STRESS RAISER',
    yielded: 'YIELDED THROUGH THE SECTION',
    'fracture predicted': 'FRACTURE PREDICTED',
  };
  return words[f.verdict];
}

/** "stress / shear yield" in words, or "stress / shear strength" for brittle material. */
export function ratioName(f: Pick<Finding, 'brittle'>): string {
  return f.brittle ? 'stress / shear strength' : 'stress / shear yield';
}

/**
 * The finding in one sentence: the verdict's word, its model, the governing piece and that model's
 * numbers for it. The one verdict line of `check`, `resize`, the report command and the report.
 */
export function findingSentence(f: Finding, u: Units, text: Text = plain): string {
  const where = `side ${f.side}, ${describePlasticPiece(f, u, text)}`;
  const head = `${verdictWord(f)} (${f.basis}): ${where}`;
  const ratio = sig(f.yieldRatio);
  const limit = f.brittle ? 'shear strength' : 'shear yield';
  switch (f.verdict) {
    case 'fracture predicted': {
      const when = f.breakTime === undefined ? '' : ` ${sig(f.breakTime * 1000)} ms after the stop began`;
      return `${head} breaks${when}, at its fracture ${f.brittle ? 'strength' : 'strain'}; had it stayed elastic its stress would be ${ratio} × ${limit}.`;
    }
    case 'yielded': {
      const twist = f.permanentTwist === undefined ? '' : ` and a permanent twist of ${show(f.permanentTwist, 'angle', u)} is left on the side`;
      return `${head}: the elastic stress would be ${ratio} × shear yield; past yield the torque there is capped at ${show(f.peakTorque, 'torque', u)}${twist}; no fracture is predicted.`;
    }
    case 'yielded locally':
      return f.brittle
        ? `${head}: the stress at its stress raiser (kt ${sig(f.piece.segment.kt)}) reaches ${ratio} × the shear strength of a brittle material; it cracks there rather than taking a permanent twist.`
        : `${head}: the stress at its stress raiser (kt ${sig(f.piece.segment.kt)}) reaches ${ratio} × shear yield while the net section stays elastic; no measurable permanent twist.`;
    case 'elastic':
      return `${head}: the highest stress is ${ratio} of ${limit} (peak torque ${show(f.peakTorque, 'torque', u)}); no ${f.brittle ? 'fracture' : 'yield'} is predicted.`;
  }
}

/** The chance of yield in one sentence, with how it was obtained and how sure it is; undefined without tolerances. */
export function chanceSentence(f: Finding): string | undefined {
  const c = f.chance;
  if (!c) return undefined;
  const pct = (p: number) => `${percent(p)} %`;
  const interval = ` (95 % interval ${pct(c.interval[0])} to ${pct(c.interval[1])})`;
  const how =
    c.method === 'control-variates'
      ? `from ${c.runs} runs of the ${c.model}, corrected by ${c.controlSamples} energy-method samples of the same draws (control variates)`
      : `the share of ${c.runs} runs of the ${c.model} that reach it`;
  return `Chance of yield under the case's tolerances: ${pct(c.probability)}${interval}, ${how}.`;
}

/** A probability in per cent, with the digits that keep it off 0 and 100 where it is not either: 0.038, 99.96. */
export function percent(p: number): string {
  if (p <= 0 || p >= 1) return String(Math.round(100 * p));
  if (p > 0.99) return String(Number((100 * p).toFixed(Math.max(1, Math.ceil(-Math.log10(1 - p)) - 2))));
  return sig(100 * p, 2);
}

/** The finding's lines for a terminal: the verdict, why that model, the chance, what to do. */
export function findingLines(f: Finding, u: Units): string[] {
  const out = [`Finding: ${findingSentence(f, u)}`, `  Why this model: ${f.basisReason}`];
  const chance = chanceSentence(f);
  if (chance) out.push(`  ${chance}`);
  const weakest = weakestSentence(f, u);
  if (weakest) out.push(`  ${weakest}`);
  out.push(`  What to do: ${f.disposition}`);
  return out;
}
