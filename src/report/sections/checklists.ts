import type { Investigation } from '../../finding/investigation.ts';
import { show, sig } from '../../views/display-units.ts';
import { describePlasticPiece } from '../../views/piece-span.ts';

/**
 * The first page's two checklists, in the plant's own words: what to look at, and with what, at the
 * finding's governing piece and along its side; then what must be done before the machine runs
 * again. The checks are common practice of the trade (crack testing of keyseats and fillets by
 * magnetic particle or dye penetrant, runout by dial indicator, keys, hubs and bearing seats by eye
 * and by hand); every name and number comes from the case and the finding.
 */
export function inspectionItems(r: Investigation): string[] {
  const f = r.finding;
  const u = r.case.units;
  const c = r.case;
  const seg = f.piece.segment;
  const name = seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}`;
  const keyed = c.stations.filter((s) => s.key && s.at >= f.piece.start - 1e-9 && s.at <= f.piece.end + 1e-9).map((s) => `"${s.name}"`);
  const where = [
    keyed.length > 0 ? `the keyseat under ${keyed.join(' and ')}` : '',
    seg.kt !== 1 ? `the fillets at the ends of ${name} (kt ${sig(seg.kt)})` : `${name} along its length and the fillets at its ends`,
  ]
    .filter(Boolean)
    .join(' and ');
  const method = f.brittle ? 'dye penetrant (brittle material: look for cracks, not bending)' : 'magnetic particle (dye penetrant where not magnetic)';
  const side = r.sides.find((s) => s.side === f.side);
  const stations = side ? side.stations.map((s) => `"${s}"`).join(', ') : 'every loaded station';
  const items = [
    `Crack test of ${where}: ${method}, on bare metal; a crack there means replace.`,
    `Runout by dial indicator, the shaft turned by hand in its bearings (or between centres): on ${describePlasticPiece(f, u)}, the journals and the shaft ends, against the builder's limit.`,
  ];
  if (f.permanentTwist !== undefined) {
    const between = f.measured[0]?.between;
    items.push(
      `Permanent twist: the angle between the keyways${between ? ` at "${between[0]}" and "${between[1]}"` : ' at the ends of the side'} with an angle gauge, against a feature that was straight before (a keyway, a spline, a flat read with a dial); the model leaves ${show(f.permanentTwist, 'angle', u)}.`,
    );
  }
  items.push(
    `Keys, keyways and hubs at ${stations}: key faces rolled or sheared, keyway ends cracked, hub bores and fits (fretting, polished bands, a hub that moved).`,
    'Bearing seats and bearings: journals fretted, scored or moved; bearings turned by hand for roughness and play.',
  );
  if (c.stations.some((s) => s.drive?.belt)) items.push('Belts and sheaves: belts burnt, glazed or stretched by slipping; worn grooves; the motor coupling.');
  return items;
}

/** What must be done, and seen to be done, before the machine runs again. */
export function beforeRunningItems(r: Investigation): string[] {
  const shaft: Record<Investigation['finding']['action'], string> = {
    replace: 'The shaft is replaced (the recommended remedy, or another the engineer signs for); keys, hubs and bearings renewed or passed by the checks.',
    'inspect before return': 'The checks above are done and written down, and the engineer has decided on them: the shaft goes back only if the crack test is clean.',
    'return to service': 'The checks above are done and written down and found nothing: no crack, runout within the limit, keys and hubs sound.',
  };
  return [
    shaft[r.finding.action],
    'What jammed the machine is found and dealt with.',
    'Every guard is back on and secure.',
    'Locks and tags are taken off only by the people who put them on; everyone is clear.',
    'Turned by hand, then run up empty and watched for vibration, noise and heat before feed is let in.',
  ];
}

/** The sign-off lines under the checklists, in plain words. */
export const SIGN_OFF_ROWS = ['Inspected by', 'Remedy fitted by', 'Handed back to production by'] as const;
