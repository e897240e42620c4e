import type { Results } from '../results/results.ts';
import { show, sig } from './display-units.ts';

/** One sentence per key and per fit at the incident torque, in the case's units; empty without either. */
export function hubSentences(r: Results): string[] {
  const u = r.case.units;
  const out: string[] = [];
  for (const k of r.keys) {
    const at = `${show(k.torque, 'torque', u)}${k.upperBound ? ' (an upper bound)' : ''}`;
    out.push(
      `Key at "${k.station}" (shaft Ø${show(k.shaftDiameter, 'length', u)}) at the incident's ${at}: shear ${show(k.shearStress, 'stress', u)}, ${sig(k.shearRatio)} × its ${k.shearYieldBasis}; bearing ${show(k.bearingStress, 'stress', u)}, ${sig(k.bearingRatio)} × its yield. It shears off at about ${show(k.shearOffTorque, 'torque', u)} (its ${k.shearOffBasis}) and crushes at ${show(k.crushTorque, 'torque', u)}; the shaft to the stop yields at ${show(k.shaftYieldTorque, 'torque', u)}.`,
    );
  }
  for (const f of r.fits) {
    const at = `${show(f.torque, 'torque', u)}${f.upperBound ? ' (an upper bound)' : ''}`;
    const fuse = f.slipsBeforeShaftYields
      ? `below the ${show(f.shaftYieldTorque, 'torque', u)} at which the shaft to the stop yields: the fit is the fuse`
      : `above the ${show(f.shaftYieldTorque, 'torque', u)} at which the shaft to the stop yields: the shaft yields first`;
    const hoop =
      f.hubYieldStrength === undefined ? '' : ` Hoop stress at the hub's bore ${show(f.hubHoopStress, 'stress', u)}, ${sig(f.hubHoopStress / f.hubYieldStrength)} × the hub's yield strength.`;
    out.push(
      `Shrink fit at "${f.station}": contact pressure ${show(f.contactPressure, 'stress', u)} (thick-cylinder relations), slip torque ${show(f.slipTorque, 'torque', u)}, ${fuse}. Torque through the hub ${at}: it ${f.slipped ? 'slipped' : 'held'}${f.inDynamicModel ? ' (the dynamic model let it slip as a slip element)' : ''}.${hoop}`,
    );
  }
  return out;
}

/** One sentence per coupling against the incident torque, in the case's units; empty without couplings. */
export function couplingSentences(r: Results): string[] {
  const u = r.case.units;
  return r.couplings.map((k) => {
    const seg = k.segment.label ? `"${k.segment.label}"` : `segment ${k.segment.index + 1}`;
    const kind = k.stiffness === undefined ? 'rigid coupling' : `coupling of ${show(k.stiffness, 'stiffness', u)}`;
    const rating =
      k.peakRating === undefined
        ? `its rated torque ${show(k.ratedTorque, 'torque', u)} (no maximum torque given)`
        : `its maximum torque ${show(k.peakRating, 'torque', u)} (rated ${show(k.ratedTorque, 'torque', u)})`;
    const verdict = k.capacityRatio > 1 ? 'past what the maker allows: inspect or replace it' : 'within what the maker allows';
    const soft = k.stiffness === undefined ? '' : " An elastomeric coupling's stiffness rises with load and falls with temperature; the data-sheet figure is a mean.";
    return `The ${kind} in ${seg} carried ${show(k.torque, 'torque', u)}, ${sig(k.capacityRatio)} × ${rating}: ${verdict}.${soft}`;
  });
}

/** One sentence per gearbox against its rating × service factor at the incident torque, in the case's units; empty without gearboxes. */
export function gearboxSentences(r: Results): string[] {
  const u = r.case.units;
  return r.gearboxes.map((g) => {
    const rating = `its rated output torque ${show(g.ratedOutputTorque, 'torque', u)} × service factor ${sig(g.serviceFactor)} = ${show(g.capacity, 'torque', u)}`;
    const verdict =
      g.ratingRatio > 1
        ? "past its rating: inspect the gearing, its bearings and its output shaft before return (the maker's peak allowance, often some twice the rated torque for a few starts, decides whether it is damaged)"
        : 'within its rating';
    const eff = g.efficiency !== 1 ? `; the motor's torque reaches the shaft at its efficiency ${sig(g.efficiency)}` : '';
    const held =
      g.heldTorque === undefined
        ? g.backDrivable
          ? ''
          : ' It is self-locking, but the dynamic model has no node at it (or it is the stop), so its lock is not modelled.'
        : g.heldTorque > 0
          ? ` Self-locking, it held the shaft against turning back with up to ${show(g.heldTorque, 'torque', u)}.`
          : ' Self-locking; the shaft never tried to turn it backwards in the window.';
    const tooth =
      g.tooth === undefined
        ? ''
        : ` Its output gear's teeth, by the Lewis equation (a first estimate: the whole load on one tooth, no dynamic, load-sharing or stress-concentration factor; Shigley 9th ed. Sec. 14-1, from memory): tooth load ${show(g.tooth.load, 'force', u)}, form factor Y ${sig(g.tooth.formFactor)}, bending stress ${show(g.tooth.bendingStress, 'stress', u)}; compare it with the gear material's allowable bending stress from its maker.`;
    return `The ${sig(g.ratio)}:1 gearbox at "${g.station}" carried ${show(g.outputTorque, 'torque', u)}${g.upperBound ? ' (an upper bound)' : ''} at its output, ${show(g.inputTorque, 'torque', u)} at its input (output ÷ (ratio × efficiency)${eff}), ${sig(g.ratingRatio)} × ${rating}: ${verdict}.${held}${tooth}`;
  });
}

/** One sentence per backstop with the rebound torque it held, in the case's units; empty without backstops. */
export function backstopSentences(r: Results): string[] {
  const u = r.case.units;
  return r.backstops.map((b) => {
    if (!b.inDynamicModel) return `The backstop at "${b.station}" is not in the dynamic model (see the warnings); it took no rebound there.`;
    if (b.reboundTorque <= 0) return `The backstop at "${b.station}" never had to hold: the shaft there did not try to turn backwards in the window.`;
    const rated =
      b.ratedTorque === undefined
        ? ' (no rated torque given: compare it with the catalogue)'
        : `, ${sig(b.ratio!)} × its rated ${show(b.ratedTorque, 'torque', u)}: ${b.ratio! > 1 ? 'past its rating: inspect its sprags or rollers and its torque arm' : 'within its rating'}`;
    return `The backstop at "${b.station}" stopped the shaft turning backwards ${b.firstHeld !== undefined ? `${Number((b.firstHeld * 1000).toPrecision(3))} ms after the stop` : ''} and held a rebound torque of up to ${show(b.reboundTorque, 'torque', u)}${rated}.`;
  });
}
