import type { Investigation } from '../finding/investigation.ts';
import type { Results } from '../results/results.ts';
import { chanceSentence } from './finding-words.ts';
import type { Uncertainty } from '../uncertainty/uncertainty.ts';
import { show, sig, type DisplayKind } from './display-units.ts';

/** Plain name of an input from its field path: "speed", "diameter of segment 2". */
export function inputName(path: string): string {
  let m = /^shaft\.segments\[(\d+)\]\.(\w+)$/.exec(path);
  if (m) return `${m[2]} of shaft segment ${Number(m[1]) + 1}`;
  m = /^materials\.(.+)\.(\w+)$/.exec(path);
  if (m) return `${m[2].replace(/_/g, ' ')} of ${m[1]}`;
  m = /^observed\.permanent_twist\[(\d+)\]\.angle$/.exec(path);
  if (m) return `measured twist ${Number(m[1]) + 1}`;
  m = /^stations\[(\d+)\]\.parts\[(\d+)\]\.(\w+)$/.exec(path);
  if (m) return `${m[3].replace(/_/g, ' ')} of part ${Number(m[2]) + 1} at station ${Number(m[1]) + 1}`;
  return path.replace(/_/g, ' ');
}

const QUANTITY: Record<string, DisplayKind> = {
  speed: 'speed',
  diameter: 'length',
  bore: 'length',
  thickness: 'length',
  radius_of_gyration: 'length',
  inertia: 'inertia',
  angle: 'angle',
  shear_modulus: 'stress',
  yield_strength: 'stress',
  tensile_strength: 'stress',
};

/** The kind of quantity an input's field path holds, for showing it in the case's units; undefined for one shown in SI (density, mass). */
export function inputQuantity(path: string): DisplayKind | undefined {
  const field = path === 'speed' ? 'speed' : /\.(\w+)$/.exec(path)?.[1];
  return field !== undefined && Object.hasOwn(QUANTITY, field) ? QUANTITY[field] : undefined;
}

/** The chance of yield in words, as a sentence without its final stop: "0.04 % of the 10000 samples reach a stress / shear yield of 1 or more". */
export function chanceOfYieldWords(u: Pick<Uncertainty, 'yieldProbability' | 'samples'>): string {
  if (u.yieldProbability === 0) return `None of the ${u.samples} samples reaches a stress / shear yield of 1 (the chance of yield is below 1 in ${u.samples})`;
  if (u.yieldProbability === 1) return `Every one of the ${u.samples} samples reaches a stress / shear yield of 1 or more`;
  return `${sig(100 * u.yieldProbability, 3)} % of the ${u.samples} samples reach a stress / shear yield of 1 or more`;
}

/** The one-line finding: which input to measure better first. */
export function sensitivityFinding(r: Results): string | undefined {
  const top = r.uncertainty?.sensitivity[0];
  if (!top) return undefined;
  return `${inputName(top.input)} moves stress / shear yield most (from ${sig(top.low)} to ${sig(top.high)} across its band): measure it better first.`;
}

/** Lines for `check`: the finding's chance first, then each model's ranges, labelled by what they are; the ranking. */
export function renderUncertaintyLines(r: Investigation): string[] {
  const u = r.uncertainty;
  if (!u) return [];
  const units = r.case.units;
  const f = r.finding;
  const [y5, y50, y95] = u.percentiles.yieldRatio;
  const [s5, , s95] = u.percentiles.maxShearStress;
  const [t5, , t95] = u.percentiles.peakTorque;
  const chance = chanceSentence(f);
  const energyRole = f.basis === 'energy method' ? "the finding's model" : 'for comparison';
  const out = [`How sure the finding is (the case's tolerances, seed ${u.seed}):`, ...(chance ? [`  ${chance}`] : [])];
  if (u.dynamic) {
    const [d5, d50, d95] = u.dynamic.percentiles.yieldRatio;
    const [p5, , p95] = u.dynamic.percentiles.peakTorque;
    out.push(
      `  dynamic model, ${u.dynamic.samples} runs (the finding's model): stress / shear yield ${sig(d50)} (5–95 %: ${sig(d5)} to ${sig(d95)}), single run ${sig(r.verdictYieldRatio)}; peak torque as carried (capped past yield) ${show(p5, 'torque', units)} to ${show(p95, 'torque', units)}`,
    );
  }
  out.push(
    `  energy method, ${u.samples} samples (${energyRole}):`,
    `    stress / shear yield  ${sig(y50)} (5–95 %: ${sig(y5)} to ${sig(y95)}); single run ${sig(r.yieldRatio)}`,
    `    elastic peak stress   ${show(s5, 'stress', units)} to ${show(s95, 'stress', units)}`,
    `    peak torque past yield (energy balance, capped)  ${show(t5, 'torque', units)} to ${show(t95, 'torque', units)}`,
  );
  if (f.basis === 'dynamic model') out.push(`    chance of yield by the energy method ${sig(100 * u.yieldProbability, 2)} % (not the finding's)`);
  const pt = u.percentiles.permanentTwist;
  if (pt && pt[2] > 0) out.push(`    permanent twist (energy balance)  ${show(pt[1], 'angle', units)} (5–95 %: ${show(pt[0], 'angle', units)} to ${show(pt[2], 'angle', units)})`);
  u.observed.forEach((o, k) => {
    const [a, b] = o.between;
    const single = r.observedFindings.twist[k];
    const none =
      single && (single.finding === 'no_loaded_shaft' || single.predicted === 0) && single.speedForMeasured === undefined
        ? 'no shaft between these stations yields in the model, so no speed interval applies (see the read-back below)'
        : 'no speed explains it in any sample';
    out.push(
      o.speedInterval
        ? `  twist "${a}"–"${b}" is explained by a stop from ${show(o.speedInterval[0], 'speed', units, 4)} to ${show(o.speedInterval[1], 'speed', units, 4)} (5–95 %); the recorded speed lies ${o.recordedInside ? 'inside' : 'outside'} it`
        : `  twist "${a}"–"${b}": ${none}`,
    );
  });
  const moving = u.sensitivity.filter((s) => sig(s.low) !== sig(s.high));
  const still = u.sensitivity.filter((s) => sig(s.low) === sig(s.high));
  if (moving.length > 0) {
    out.push('  inputs by effect on stress / shear yield (energy method, one at a time):');
    for (const s of moving) out.push(`    ${inputName(s.input).padEnd(36)} ${sig(s.low)} to ${sig(s.high)}`);
    out.push(`  ${sensitivityFinding(r)}`);
  }
  if (still.length > 0) out.push(`  no effect on stress / shear yield at the shown precision: ${still.map((s) => inputName(s.input)).join(', ')}`);
  if (u.notVaried.length > 0) out.push(`  not varied (the Monte Carlo does not move these): ${u.notVaried.join(', ')}`);
  return out;
}
