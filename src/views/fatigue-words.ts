import type { IncidentFatigue } from '../finding/incident-fatigue.ts';
import type { AssetHistory } from '../log/asset-history.ts';
import { sig } from './display-units.ts';
import { damagePercent } from './log-table.ts';

/** The incident's fatigue in one sentence: the share of crack-initiation life used and where the constants come from. */
export function fatigueSentence(z: IncidentFatigue): string {
  const counted = z.ringDown ? `the jam and its ring-down, ${z.cycles.length} ranges counted` : 'the jam';
  const source = z.propertiesSource === 'case material' ? "the case's cyclic constants" : 'constants estimated by the uniform material law';
  return `Fatigue at the stress raiser (kt ${sig(z.kt)}): this incident used about ${damagePercent(z.damage)} of the crack-initiation life (${counted}; ${source}).`;
}

/** The case's place in its asset's history, in plain words. */
export function assetHistorySentences(h: AssetHistory): string[] {
  const place = h.incidents === 1 ? `the only incident of ${h.asset} found under ${h.searched}` : `incident ${h.position} of ${h.incidents} of ${h.asset} found under ${h.searched}`;
  return [
    `This is ${place}; it added ${damagePercent(h.incidentDamage)}, and the asset's Miner sum is ${damagePercent(h.assetDamage)}.`,
    h.finding.sentence[0].toUpperCase() + h.finding.sentence.slice(1),
    `The whole history: shaftcase log ${h.searched} --html FILE.`,
  ];
}

/** The cautions of a fatigue estimate, shown with it. */
export const FATIGUE_CAUTIONS = [
  'Fatigue estimates scatter by a factor of several in life; the damage is an estimate, not a measurement.',
  'A crack test (magnetic particle or dye penetrant at the stress raiser) decides; a shaft near its estimated life is inspected before it goes back in.',
] as const;
