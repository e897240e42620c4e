import type { Results } from '../results/results.ts';
import { decideFinding, type Finding } from './finding.ts';

/** The results of a case with its finding decided: what every view renders. */
export interface Investigation extends Results {
  finding: Finding;
}

/** The results with their finding, decided once (after the uncertainty run, whose chance it carries). */
export function withFinding(r: Results): Investigation {
  return { ...r, finding: decideFinding(r) };
}
