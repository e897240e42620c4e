import type { RatedSpeedCheck } from './rated-speed.ts';

/** One guarding recommendation: a short heading and the sentence in the trade's words. */
export interface Recommendation {
  topic: string;
  text: string;
}

const rpm = (w: number) => `${Math.round((w * 60) / (2 * Math.PI))} rpm`;

/**
 * What has to be true before the machine runs again, whichever option goes back in. Plain rules of
 * the trade (guarding of power transmission, 29 CFR 1910.219; abrasive wheels, 29 CFR 1910.215(d)(1)
 * and ANSI B7.1 Sec. 7.1.1; lockout/tagout, 29 CFR 1910.147; see shared REFERENCE section 11), each
 * deferring to local codes and the machine builder's instructions.
 */
export function guardingRecommendations(wheels: readonly RatedSpeedCheck[]): Recommendation[] {
  const out: Recommendation[] = [
    {
      topic: 'Guards',
      text: 'Put back every guard over exposed rotating parts (belts, sheaves, couplings, shaft ends, the rotor housing) and check each is secure before the machine is restarted. A guard taken off for the investigation is not left off "for now".',
    },
    {
      topic: 'Cause of the jam',
      text: 'Find and deal with what jammed the machine before it runs again: tramp material in the feed (bolts, tools, lumps), the feed rate, or the way material reaches the working part. Where tramp metal got in, fit or repair the magnet, screen or metal detector in the feed.',
    },
    {
      topic: 'Restart',
      text: 'Restart to a written procedure: the locks and tags are removed only by the people who put them on, everyone is clear, guards are in place, the shaft is turned by hand or jogged first, then the machine is run up empty while someone watches for vibration, noise and heat, before feed is let in.',
    },
    {
      topic: 'Abrasive and cutting wheels',
      text: 'An abrasive wheel, cut-off wheel or saw blade that was stopped violently is taken off and inspected for cracks, chips and a shifted or damaged bore before it is used again, and ring-tested where that is the practice (bonded abrasive wheels); when in doubt it is scrapped. A wheel is never run above the speed marked on it.',
    },
  ];
  for (const w of wheels) {
    out.push({
      topic: `Marked speed: ${w.part} at "${w.station}"`,
      text: w.over
        ? `It ran at ${rpm(w.speed)} at the incident, above the ${rpm(w.ratedSpeed)} marked on it. Scrap it, and find out why it ran above its marking before any wheel goes back on.`
        : `It ran at ${rpm(w.speed)} at the incident, within the ${rpm(w.ratedSpeed)} marked on it. Check the speed again against the marking of any replacement wheel.`,
    });
  }
  out.push({
    topic: 'Codes',
    text: "These recommendations defer to local codes and regulations and to the machine builder's instructions, which govern where they say more or otherwise.",
  });
  return out;
}
