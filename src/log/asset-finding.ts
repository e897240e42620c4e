/** What an asset's fatigue adds up to, decided once; the log's views render it. */
export interface AssetFinding {
  /** The share of the crack-initiation life used, the Miner sum. */
  used: number;
  /** Further jams like the worst one before the sum reaches 1; undefined where it has. */
  jamsLeft: number | undefined;
  /** Whether the sum is at or past 1 or within a tenth of it: inspect before it goes back in. */
  inspect: boolean;
  /** The finding in plain words. */
  sentence: string;
}

/** The share of life near the estimate's end at which the log asks for a crack test before return to service. */
export const INSPECT_AT = 0.9;

/**
 * The plain-word finding of an asset: the share of its crack-initiation life its jams used, and at
 * that rate how many more jams like the worst one before the Palmgren–Miner sum reaches 1.
 */
export function assetFinding(a: { asset: string; incidents: number; damage: number; worst_damage: number; segments: readonly string[] }): AssetFinding {
  const used = a.damage;
  const where = a.segments.length === 1 ? `${a.asset}'s "${a.segments[0]}"` : `${a.asset} (at ${a.segments.map((s) => `"${s}"`).join(', ')}, added as if at one place, which overstates)`;
  const jams = `${a.incidents} jam${a.incidents === 1 ? '' : 's'}`;
  const inspect = used >= INSPECT_AT;
  if (used >= 1) {
    return { used, jamsLeft: undefined, inspect, sentence: `${where} has used its estimated crack-initiation life (${percent(used)}) in ${jams}: a crack test decides before it goes back in.` };
  }
  const jamsLeft = a.worst_damage > 0 ? Math.floor((1 - used) / a.worst_damage) : undefined;
  const rate = jamsLeft === undefined ? 'the jams add no damage the estimate can count' : `at this rate about ${jamsLeft} more jam${jamsLeft === 1 ? '' : 's'} like the worst one`;
  return {
    used,
    jamsLeft,
    inspect,
    sentence: `${where} has used about ${percent(used)} of its crack-initiation life in ${jams}; ${rate}${inspect ? '; inspect it for cracks before it goes back in' : ''}.`,
  };
}

/** A share as a whole percentage, or "less than 1 %" below that (never "0 %" for damage done). */
function percent(x: number): string {
  if (x > 0 && x < 0.01) return 'less than 1 %';
  return `${Math.round(x * 100)} %`;
}
