import type { Case } from '../case/case.ts';
import type { RatedSpeedCheck } from './rated-speed.ts';

/** One guarding recommendation: a short heading and the sentence in the trade's words. */
export interface Recommendation {
  topic: string;
  text: string;
}

const rpm = (w: number) => `${Math.round((w * 60) / (2 * Math.PI))} rpm`;

/**
 * Words in a case's title or notes that say the jam was foreign matter (tramp metal, a tool or bar
 * left in the machine) rather than the machine's own product or a part of the machine. A plain
 * reading of the user's text: where it names none of these, the tramp-metal advice is left out.
 */
const FOREIGN_MATTER = /\b(tramp|foreign|bolts?|nuts?|washers?|tools?|spanners?|wrench(es)?|hammers?|bars?|chisels?|metal|stones?|rocks?)\b/i;

/** Part names that say a part is an abrasive or cutting wheel, a saw or a blade. */
const WHEEL = /abrasive|grind|cut-?off|cutting wheel|\bsaws?\b|\bblades?\b/i;

/** Whether the case's own text says the jam was foreign matter. */
export function jamWasForeignMatter(c: Pick<Case, 'meta'>): boolean {
  return FOREIGN_MATTER.test(`${c.meta.title ?? ''} ${c.meta.notes ?? ''}`);
}

/** Whether the case has an abrasive or cutting wheel, saw or blade: a part with a marked speed, or one named so. */
export function hasWheel(c: Pick<Case, 'stations'>): boolean {
  return c.stations.some((s) => s.parts.some((p) => p.ratedSpeed !== undefined || WHEEL.test(p.name)));
}

/**
 * What has to be true before the machine runs again, whichever option goes back in. Plain rules of
 * the trade (guarding of power transmission, 29 CFR 1910.219; abrasive wheels, 29 CFR 1910.215(d)(1)
 * and ANSI B7.1 Sec. 7.1.1; lockout/tagout, 29 CFR 1910.147; see shared REFERENCE section 11), each
 * deferring to local codes and the machine builder's instructions. Only what applies to this
 * machine: the wheel advice where the case has a wheel, saw or blade (`hasWheel`), the tramp-metal
 * advice where its text says the jam was foreign matter (`jamWasForeignMatter`); the guards, the
 * cause of the jam, the restart under lockout/tagout and the codes always.
 */
export function guardingRecommendations(c: Pick<Case, 'meta' | 'stations'>, wheels: readonly RatedSpeedCheck[]): Recommendation[] {
  const out: Recommendation[] = [
    {
      topic: 'Guards',
      text: 'Put back every guard over exposed rotating parts (belts, sheaves, couplings, shaft ends, the rotor housing) and check each is secure before the machine is restarted. A guard taken off for the investigation is not left off "for now".',
    },
    {
      topic: 'Cause of the jam',
      text: 'Find and deal with what jammed the machine before it runs again, with every energy source locked out and tagged out while anyone clears it: the feed rate, the way material reaches the working part, or a part of the machine that came loose.',
    },
  ];
  if (jamWasForeignMatter(c)) {
    out.push({
      topic: 'Foreign matter',
      text: 'The jam was foreign matter: find how it got in (tramp metal in the feed, a tool or bar left in the machine). Fit or repair the magnet, screen or metal detector in the feed where tramp metal got in, and count tools and loose parts out and back in at every cleaning or repair.',
    });
  }
  out.push({
    topic: 'Restart',
    text: 'Restart to a written procedure: the locks and tags are removed only by the people who put them on, everyone is clear, guards are in place, the shaft is turned by hand or jogged first, then the machine is run up empty while someone watches for vibration, noise and heat, before feed is let in.',
  });
  if (hasWheel(c)) {
    out.push({
      topic: 'Abrasive and cutting wheels',
      text: 'An abrasive wheel, cut-off wheel or saw blade that was stopped violently is taken off and inspected for cracks, chips and a shifted or damaged bore before it is used again, and ring-tested where that is the practice (bonded abrasive wheels); when in doubt it is scrapped. A wheel is never run above the speed marked on it.',
    });
  }
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
