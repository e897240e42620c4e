import type { AssetHistory } from '../log/asset-history.ts';
import type { Results } from '../results/results.ts';
import { decideFinding, type Finding } from './finding.ts';

/** The results of a case with its finding decided: what every view renders. */
export interface Investigation extends Results {
  finding: Finding;
  /** The case's place in its asset's history, where the case has `case.asset` and the CLI looked for the others (`withAssetHistory`). */
  assetHistory?: AssetHistory;
}

/** The results with their finding, decided once (after the uncertainty run, whose chance it carries). */
export function withFinding(r: Results): Investigation {
  return { ...r, finding: decideFinding(r) };
}
