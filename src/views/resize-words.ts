import type { Case } from '../case/case.ts';
import type { CombinedOption, SetLimiter } from '../resize/combined-options.ts';
import type { FuseOrder } from '../resize/fuse-order.ts';
import type { KeyFuse } from '../resize/key-fuse.ts';
import type { OptionId, ResizeResult } from '../resize/resize-result.ts';
import { sideYieldRatio } from '../resize/side-ratio.ts';
import type { RunningCheck } from '../resize/running-check.ts';
import { show, sig } from './display-units.ts';
import { showDiameter } from './show-diameter.ts';
import { describePiece } from './summary.ts';

// The sentences of the resize output, shared by the terminal table, the JSON's reasons and the
// report section, so all three say the same thing. Every number comes from the ResizeResult.

/** A segment as the output names it: its label in quotes, or "segment 3". */
export const segName = (s: { label?: string; index: number }) => (s.label ? `"${s.label}"` : `segment ${s.index + 1}`);

/** "0.667" — stress / shear yield a replacement may reach at design factor N. */
export function allowedRatio(z: ResizeResult): string {
  return sig(1 / z.designFactor);
}

export function factorSentence(z: ResizeResult): string {
  return `Design factor N = ${sig(z.designFactor)} on shear yield in a repeat of the incident, so a replacement keeps a stress / shear yield of ${allowedRatio(z)} or less. N is the engineer's choice: confirm it against the site's rules.`;
}

export function runningWords(r: RunningCheck, units: Case['units']): string {
  if (!r.running) return 'unknown: no drive in the case';
  if (r.factorWithKt === undefined) return `${show(r.running.torque, 'torque', units)}: no shaft between the drive and the stop`;
  return `${sig(r.factorWithKt)} (${sig(r.factorStatic!)})${r.keeps ? '' : ', below N'}`;
}

export function scaleSideSentence(z: ResizeResult): string {
  const o = z.scaleSide;
  const u = z.results.case.units;
  const sizes = o.segments.map((g, i) => `${segName(g)} Ø${showDiameter(g.diameter, u)} → ${showDiameter(o.diameters[i], u)} (stock ${showDiameter(o.stockDiameters[i], u)})`).join('; ');
  const coupled = o.segments.some((g) => g.coupling?.stiffness !== undefined);
  const how = coupled
    ? `s = ${sig(o.s, 4)}, found by rerunning the energy method (the flexible coupling's compliance does not scale with the shaft, so stress falls faster than 1/s)`
    : `s = ${sig(o.presentYieldRatio)} × ${sig(z.designFactor)} = ${sig(o.s, 4)}, bores with them (stress falls as 1/s in the energy method)`;
  const head = `Scale side ${o.side}: every segment of the side by ${how}: ${sizes}.${z.results.finding.basis === 'dynamic model' ? ` ${sig(o.presentYieldRatio)} is the energy method's stress / shear yield, the design check's, which leans to the high side here; the finding's model gives ${sig(z.results.finding.yieldRatio)}.` : ''}`;
  const rerun = `Rerun: side ${o.side}'s stress / shear yield ${sig(sideYieldRatio(o.rerun, o.side), 4)} at the exact sizes, ${sig(sideYieldRatio(o.stockRerun, o.side), 4)} at the stock sizes; peak torque ${show(o.stockRerun.sides.find((s) => s.side === o.side)!.peakTorque, 'torque', u)}. The table's ratios for the scaled shaft are taken at the stock sizes, each bore scaled with its stock diameter (the bore ratio kept).`;
  const otherWords = otherSidesWords(z, o.stockRerun, o.side);
  if (!o.needed)
    return `${head} ${rerun} The present shaft already keeps the factor (s ≤ 1): no larger shaft is needed for a repeat of this incident; do not make it smaller on this basis alone.${otherWords}`;
  const verdict = o.practical
    ? `s is within ${sig(o.maxScale)} (analysis.max_scale), so the new diameters may still fit; check them against the bearings and hubs.`
    : `s is above ${sig(o.maxScale)} (analysis.max_scale): no practical shaft survives a repeat of this incident elastically. The remedy is to limit the torque (see the torque limiter).`;
  return `${head} ${rerun} ${verdict}${otherWords}`;
}

export function criticalSegmentSentence(z: ResizeResult): string {
  const o = z.criticalSegment;
  const u = z.results.case.units;
  const name = `${segName(o.segment)} (Ø${showDiameter(o.segment.diameter, u)}${o.segment.kt !== 1 ? `, kt ${o.segment.kt}` : ''})`;
  if (o.verdict === 'others-critical') {
    return `No size of ${name} alone keeps side ${o.side} within the factor: at Ø${showDiameter(o.ownDiameter, u)}, where it reaches ${allowedRatio(z)}, the stiffer shaft raises the torque and the rest of the side reaches a stress / shear yield of ${sig(o.othersAtOwn)}. The other segments then become critical.`;
  }
  const stock = `Stock size Ø${showDiameter(o.stockDiameter!, u)}; rerun: side ${o.side}'s stress / shear yield ${sig(sideYieldRatio(o.stockRerun!, o.side), 4)}.`;
  if (o.verdict === 'present-keeps') {
    return `${name} already keeps the factor (stress / shear yield ${sig(o.presentYieldRatio)}); the smallest diameter that would is Ø${showDiameter(o.diameter!, u)}. ${stock} Do not make it smaller on this basis alone.`;
  }
  const warn =
    sideYieldRatio(o.stockRerun!, o.side) * z.designFactor > 1 + 1e-9
      ? ' At the stock size the stiffer segment pushes the side just past the factor: take the next size down and check, or accept the small excess knowingly.'
      : '';
  return `Resize ${name} only: the smallest diameter that keeps every segment of side ${o.side} within the factor is Ø${showDiameter(o.diameter!, u)}. ${stock}${warn}${otherSidesWords(z, o.stockRerun!, o.side)}`;
}

export function materialsSentence(z: ResizeResult): string {
  const keep = z.materials.filter((m) => m.keepsFactor);
  if (keep.length === 0) {
    const best = z.materials[0];
    return `No library material keeps the factor with the present geometry; the best, ${best.material.key}, reaches a stress / shear yield of ${sig(best.yieldRatio)}.`;
  }
  const typical = keep.some((m) => m.material.strengthBasis === 'typical') ? ' Strengths marked "typical" are mean values, not minima: get the mill certificate before relying on them.' : '';
  return `With the present geometry these library materials keep the factor (a lower G also lowers the torque): ${keep.map((m) => `${m.material.key} (${sig(m.yieldRatio)})`).join(', ')}.${typical}`;
}

export function limiterSentences(z: ResizeResult): string[] {
  const o = z.limiter;
  const u = z.results.case.units;
  const w = o.weakest;
  const out = [`Place: ${o.placement}.`, limiterModelWords(z)];
  const upper = `the shaft's allowable torque ${show(o.max, 'torque', u)} (${describeRunPiece(w, u)} reaches shear yield at ${show(w.yieldTorque, 'torque', u)}, over N = ${sig(o.designFactor)})`;
  if (o.min === undefined) {
    out.push(`Window: up to ${upper}. The lower end is unknown: the case gives no running torque. Add drive: { power: "22 kW" } or drive: { running_torque: "450 N*m" } to the driving station.`);
  } else if (o.windowEmpty) {
    out.push(
      `THE WINDOW IS EMPTY: the running torque ${show(o.runningTorque!.torque, 'torque', u)} × service factor ${sig(o.serviceFactor)} = ${show(o.min, 'torque', u)} exceeds ${upper}. No limiter setting both runs the machine and protects this shaft at this factor: the shaft's weakest section must be made stronger first.`,
    );
  } else {
    out.push(
      `Window: from the running torque ${show(o.runningTorque!.torque, 'torque', u)} (${o.runningTorque!.source}) × service factor ${sig(o.serviceFactor)} = ${show(o.min, 'torque', u)} up to ${upper}.`,
    );
  }
  const s = o.slip;
  out.push(
    s.slipEnergy > 0
      ? s.slipMethod === 'dynamic model'
        ? `In a repeat incident at ${show(s.setting, 'torque', u)} the peak torque between the limiter and the stop is ${show(s.peakTorque, 'torque', u)} (from ${show(s.unlimitedTorque, 'torque', u)}); the limiter slips through ${show(s.slipAngle, 'angle', u)} and dissipates ${show(s.slipEnergy, 'energy', u)}; the parts behind it had ${show(s.energy, 'energy', u)}, and the drive can add more while it slips (${s.method}).`
        : `In a repeat incident at ${show(s.setting, 'torque', u)} the peak torque is held to the setting (from ${show(s.unlimitedTorque, 'torque', u)}); the limiter slips through ${show(s.slipAngle, 'angle', u)} and dissipates ${show(s.slipEnergy, 'energy', u)} of the ${show(s.energy, 'energy', u)} behind it (${s.method}).`
      : `At ${show(s.setting, 'torque', u)} the limiter would not slip in a repeat of this incident: the peak torque ${show(s.peakTorque, 'torque', u)} stays below the setting (${s.method}).`,
  );
  if (s.note) out.push(s.note);
  if (s.stopWave) {
    out.push(
      `That peak is above the setting because the stop is taken as instantaneous: it sends a torsional stress wave into the shaft next to it, ω·J_p·√(G·ρ) = ${show(s.stopWave.torque, 'torque', u)} in ${s.stopWave.piece} on top of the running torque, before the limiter can feel the stop, and no limiter cuts it. It belongs to the idealised stop: a stop spread over a few milliseconds (stop.duration) brings the peak there close to the setting.`,
    );
  }
  if (o.unlimitedStations.length > 0) out.push(`The parts at ${o.unlimitedStations.map((n) => `"${n}"`).join(', ')} lie between the limiter and the stop and still drive the shaft unlimited.`);
  for (const s2 of o.otherSides) if (s2.yieldRatio * z.designFactor > 1) out.push(`Side ${s2.side} (stress / shear yield ${sig(s2.yieldRatio)}) is not protected by this limiter; it needs its own.`);
  return out;
}

export function keySentences(z: ResizeResult, k: KeyFuse): string[] {
  const u = z.results.case.units;
  const dims = `${showDiameter(k.key.width, u)} × ${showDiameter(k.key.height, u)} × ${showDiameter(k.key.length, u)}`.replace(/ (mm|in) ×/g, ' ×');
  const out = [
    `Key at "${k.station}": ${dims}, ${k.material.key}, in ${segName(k.segment)} Ø${showDiameter(k.segment.diameter, u)}; bearing ${k.key.hubDepth === undefined ? 'on half its height (h/2)' : `on ${showDiameter(k.key.hubDepth, u)} in the hub`}.`,
  ];
  const at = (label: string, s: KeyFuse['incident']) =>
    `${label} ${show(s.torque, 'torque', u)}: shear ${show(s.shearStress, 'stress', u)} (${sig(s.shearRatio)} × its shear yield), bearing ${show(s.bearingStress, 'stress', u)} (${sig(s.bearingRatio)} × its yield).`;
  out.push(at('Under the incident torque', k.incident));
  if (k.atLimiter) out.push(at("Under the limiter's setting", k.atLimiter));
  if (k.atRunning) out.push(`Under the running torque ${show(k.atRunning.torque, 'torque', u)} it keeps a factor of ${sig(k.atRunning.factor)}.`);
  out.push(
    k.shearsBeforeShaftYields
      ? `It shears off at about ${show(k.shearOffTorque, 'torque', u)} (${k.shearOffBasis}), before the shaft yields at ${show(k.shaftYieldTorque, 'torque', u)}.`
      : `It shears off only at about ${show(k.shearOffTorque, 'torque', u)} (${k.shearOffBasis}); the shaft yields first, at ${show(k.shaftYieldTorque, 'torque', u)}.`,
  );
  out.push(...k.notes);
  out.push(
    "Caution: a key is a poor and unpredictable fuse. Fit, fretting, wear and the hub's grip change the torque it fails at, a sheared key can wedge and keep driving, and the keyway is damaged either way; use a torque limiter to protect the shaft.",
  );
  return out;
}

/** " Side B is then at a stress / shear yield of 5.21, past the factor: …" for each other side a change leaves past N. */
function otherSidesWords(z: ResizeResult, rerun: Pick<ResizeResult['results'], 'sides'>, side: string): string {
  return rerun.sides
    .filter((s) => s.side !== side && sideYieldRatio(rerun, s.side) * z.designFactor > 1 + 1e-9)
    .map((s) => ` Side ${s.side} is then at a stress / shear yield of ${sig(sideYieldRatio(rerun, s.side))}, past the factor: it needs its own remedy.`)
    .join('');
}

function describeRunPiece(w: ResizeResult['limiter']['weakest'], u: Case['units']): string {
  return describePiece(w, u) + (w.piece.segment.kt !== 1 ? ` with kt ${w.piece.segment.kt}` : '');
}

/** An option's name as the options table shows it. */
export function optionName(z: ResizeResult, id: OptionId): string {
  if (id === 'present') return 'Present shaft';
  if (id === 'scale_side') return `Scale side ${z.scaleSide.side} ×${sig(z.scaleSide.s)}`;
  if (id === 'critical_segment') return `Resize ${segName(z.criticalSegment.segment)} only`;
  if (id === 'limiter') return `Torque limiter at "${z.limiter.station}"`;
  const o = z.combined.find((x) => x.option === id);
  if (o) return combinedName(o);
  return `Material ${id.slice('material:'.length)}`;
}

/** A combined option's name: "Limiter at "drive sheave" at a stated setting, like-for-like shaft". */
export function combinedName(o: CombinedOption): string {
  const at = `${o.limiters.length > 1 ? 'Limiters' : 'Limiter'} at ${o.limiters.map((l) => `"${l.station}"`).join(' and ')}`;
  if (o.option === 'limiter_setting') return `${at}, stated setting`;
  if (o.option === 'limiter_material') return `${at} + ${o.material!.key}`;
  return `${at} + larger ${o.segments.map((g) => segName(g.segment)).join(', ')}`;
}

/** "set at 2140 N·m, the middle of its window 1500 to 3030 N·m": a limiter's stated setting in words. */
export function settingWords(l: SetLimiter, u: Case['units']): string {
  const at = `set at ${show(l.setting, 'torque', u)}`;
  if (l.presentWindow) return `${at}, the ${l.settingRule.replace('the window', "the present shaft's window")}, where this shaft allows up to ${show(l.max, 'torque', u)}`;
  if (l.settingRule === 'middle of the window') return `${at}, the middle of its window ${show(l.min!, 'torque', u)} to ${show(l.max, 'torque', u)}`;
  if (l.settingRule === 'top of the window') return `${at}, the top of its window${l.min === undefined ? ' (its lower end needs the running torque)' : ''}`;
  return `${at}, the lowest setting that runs the machine (the running torque × the service factor), with the shaft's window reaching ${show(l.max, 'torque', u)}`;
}

/** "the limiter at "drive sheave" is the fuse at 2140 N·m; behind it the shaft in "sheave seat" gives way at 2.13 × the setting, …", and what must be stronger. */
export function fuseWords(f: FuseOrder, u: Case['units']): string {
  return `the limiter at "${f.station}" is the fuse at ${show(f.setting, 'torque', u)}${f.steps.length + f.uprate.length > 0 ? `; ${ladderWords(f, u)}` : ''}`;
}

/** "behind it the shaft in "sheave seat" gives way at 2.13 × the setting, the key at "drive sheave" at 2.73 ×; fit a coupling of rating at least …". */
export function ladderWords(f: FuseOrder, u: Case['units']): string {
  const steps = f.steps.map(
    (s, i) => `${s.element} ${i === 0 ? 'gives way ' : ''}at ${sig(s.multiple)} ×${i === 0 ? ' the setting' : ''}${s.seatChanged ? ' (at its present size: size it again for the new seat)' : ''}`,
  );
  const uprate = f.uprate.map((s) =>
    s.kind === 'coupling'
      ? `fit a coupling of rating at least ${show(s.needed, 'torque', u)} in place of ${s.element}`
      : `${s.element} must carry ${show(s.needed, 'torque', u)} (N × the repeat's torque through it; it gives way at ${show(s.capacity, 'torque', u)})`,
  );
  return [...(steps.length > 0 ? [`behind it ${steps.join(', ')}`] : []), ...uprate].join('; ');
}

/** A combined option in words: its shaft, each limiter's setting, slip and the order of giving way behind it. */
export function combinedSentences(z: ResizeResult, o: CombinedOption): string[] {
  const u = z.results.case.units;
  const shaft =
    o.option === 'limiter_setting'
      ? 'A shaft of the present sizes and material (like for like).'
      : o.option === 'limiter_material'
        ? `A shaft of ${o.material!.name} (${o.material!.key}) on the present drawing: the weakest of the present shaft's family in the library that carries N × each setting with the overshoot the last rerun showed.`
        : `The present material, with ${o.segments.map((g) => `${segName(g.segment)} Ø${showDiameter(g.segment.diameter, u)} → ${showDiameter(g.stockDiameter, u)} (×${sig(g.growth)}, stock size, bore ratio kept)`).join('; ')}: each piece of the limited run that could not carry N × its setting with the overshoot made larger.`;
  const out = [shaft];
  for (const l of o.limiters) {
    const s = l.slip;
    out.push(
      `The limiter at "${l.station}" (side ${l.side}), ${settingWords(l, u)}: in a repeat of the incident the peak torque between it and the stop is ${show(s.peakTorque, 'torque', u)}${s.slipEnergy > 0 ? `, it slips through ${show(s.slipAngle, 'angle', u)} and dissipates ${show(s.slipEnergy, 'energy', u)}` : ' and it does not slip'}; side ${l.side}'s stress / shear yield ${sig(l.yieldRatio)} (${s.method}). In the order of giving way, ${fuseWords(l.fuses, u)}.`,
    );
  }
  for (const x of o.otherSides) if (x.yieldRatio * z.designFactor > 1 + 1e-9) out.push(`Side ${x.side} (stress / shear yield ${sig(x.yieldRatio)}) has no limiter in this option.`);
  return out;
}

/** Which combinations are made and why, one sentence for the views' heading of the combined options. */
export const COMBINED_WHY =
  "Made where no option alone passes: a torque limiter (one on each side of the stop that needs one) set at a stated torque inside its window (its middle on a log scale where both ends are known), then, where that fails, with a stronger material of the same family, then with the pieces that cannot carry it made larger. A key or a shear pin is not combined as the fuse: a key is no dependable fuse, and a pin that parts leaves the stop's own stress wave as it is.";

/** Where resize picks nothing: why, in plain words (the combination that came nearest, and what stops it). */
export function noPickSentence(z: ResizeResult): string {
  const nearest = [...z.combined].sort((a, b) => a.yieldRatio - b.yieldRatio)[0];
  if (!nearest) return 'none of the options alone; each has a flag. Combine them (for example a stronger shaft and a torque limiter) and check the combination with the machine builder.';
  return `none of the options alone or combined passes every check. The nearest, ${combinedName(nearest).replace(/^L/, 'l')}: ${nearest.flags[0]}. Decide the remedy with the machine builder.`;
}

/** Every option with its flags, in the table's order, those without a flag left out. */
export function flaggedOptions(z: ResizeResult): { name: string; flags: string[] }[] {
  return [
    { name: optionName(z, 'scale_side'), flags: z.scaleSide.flags },
    { name: optionName(z, 'critical_segment'), flags: z.criticalSegment.flags },
    ...z.materials.map((m) => ({ name: `Material ${m.material.key}`, flags: m.flags })),
    { name: optionName(z, 'limiter'), flags: z.limiter.flags },
    ...z.keys.map((k) => ({ name: `Key as fuse at "${k.station}"`, flags: k.flags })),
    ...z.combined.map((o) => ({ name: combinedName(o), flags: o.flags })),
  ].filter((o) => o.flags.length > 0);
}

/** The pick with its key figure in the case's units: "Recommended: fit a torque limiter at …". */
export function recommendedSentence(z: ResizeResult): string {
  const p = z.recommended;
  if (!p) return `Recommended: ${noPickSentence(z)}`;
  return `Recommended: ${recommendedChange(z, p.option)} Why: ${p.reason}`;
}

/** What the picked option changes, with its figure. */
export function recommendedChange(z: ResizeResult, id: OptionId): string {
  const u = z.results.case.units;
  if (id === 'present') return 'a replacement like for like (the present sizes and material), if one is needed at all.';
  if (id === 'scale_side') {
    const s = z.scaleSide;
    return `scale side ${s.side} ×${sig(s.s)}, bores with the diameters: ${s.segments.map((g, i) => `${segName(g)} Ø${showDiameter(g.diameter, u)} → ${showDiameter(s.stockDiameters[i], u)}`).join('; ')}.`;
  }
  if (id === 'critical_segment') {
    const k = z.criticalSegment;
    return `resize ${segName(k.segment)} only, Ø${showDiameter(k.segment.diameter, u)} → ${showDiameter(k.stockDiameter!, u)} (stock size), the rest of the shaft as it is.`;
  }
  if (id === 'limiter') {
    const l = z.limiter;
    const window =
      l.min === undefined
        ? `set at no more than ${show(l.max, 'torque', u)} (the lower end of its window needs the running torque)`
        : `set within ${show(l.min, 'torque', u)} to ${show(l.max, 'torque', u)}, checked at ${show(l.slip.setting, 'torque', u)}`;
    return `fit a torque limiter at "${l.station}", ${window}, on a shaft of the present sizes and material.`;
  }
  const o = z.combined.find((x) => x.option === id);
  if (o) {
    const limiters = o.limiters.map((l) => `a torque limiter at "${l.station}" ${settingWords(l, u)}`).join(' and ');
    const shaft =
      o.option === 'limiter_setting'
        ? 'a shaft of the present sizes and material'
        : o.option === 'limiter_material'
          ? `a shaft of ${o.material!.name} (${o.material!.key}) on the present drawing`
          : `the present material with ${o.segments.map((g) => `${segName(g.segment)} Ø${showDiameter(g.segment.diameter, u)} → ${showDiameter(g.stockDiameter, u)}`).join('; ')}`;
    return `fit ${limiters}, on ${shaft}; ${o.limiters.map((l) => ladderWords(l.fuses, u)).join('; ')}.`;
  }
  const m = z.materials.find((x) => `material:${x.material.key}` === id)!;
  return `make the shaft of ${m.material.name} (${m.material.key}) on the present drawing.`;
}

/** Where the limiter sits in the model: the same place the option names. */
function limiterModelWords(z: ResizeResult): string {
  const o = z.limiter;
  const u = z.results.case.units;
  const s = o.slip;
  if (s.slipMethod === 'dynamic model' && s.segment !== undefined && s.modelledFrom !== undefined && s.modelledTo !== undefined) {
    const seg = z.results.case.shaft.segments[s.segment];
    if (s.modelledInExisting)
      return `Modelled as the limiter the case already has, in ${segName(seg)} from ${show(s.modelledFrom, 'length', u)} to ${show(s.modelledTo, 'length', u)}, at the new setting.`;
    return `Modelled there: as a slip element in ${segName(seg)} from ${show(s.modelledFrom, 'length', u)} to ${show(s.modelledTo, 'length', u)}, right beside "${o.station}" on the stop's side, so the parts at "${o.station}" and beyond drive through it.`;
  }
  return `Modelled there: the parts at "${o.station}" and beyond are behind the limiter, and the shaft from "${o.station}" to the stop carries the torque it holds.`;
}
