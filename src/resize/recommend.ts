import { materialFamily } from '../materials/material-family.ts';
import type { OptionId, Recommended, ResizeResult } from './resize-result.ts';
import { sideYieldRatio } from './side-ratio.ts';

/**
 * The rule the pick follows, in words every view prints. Least change first, because every change
 * beyond the shaft (a bore, a bearing, a device in the drive line) brings its own fits, checks and
 * failures; the torque limiter first where the side would have to grow past analysis.max_scale,
 * because then no practical shaft survives a repeat and only limiting the torque does.
 */
export const PICK_RULE =
  'The pick is the least change that keeps the design factor N both in a repeat of the incident and under the running torque, with no flag against it. In order of change: the present sizes and material, where they already keep N; another material of the same family on the same drawing; the critical segment alone; every segment of the side scaled; a torque limiter. Where the side would have to grow by more than analysis.max_scale, the torque limiter is tried first. Where none passes, the combinations: a limiter (one a side where both need one) at a stated setting on a like-for-like shaft, then with a stronger material of the same family, then with larger pieces.';

interface Candidate {
  option: OptionId;
  flags: readonly string[];
  /** Why this one, in words: what it changes and its numbers. */
  why: string;
}

const r3 = (x: number) => String(Number(x.toPrecision(3)));

/**
 * One option picked by `PICK_RULE` from a flagged resize result, with the reason; undefined where
 * every option has a flag (the views then say that no single option passes and the engineer
 * combines them). Pure.
 */
export function recommendOption(z: Omit<ResizeResult, 'recommended' | 'pickRule'>): Recommended | undefined {
  const N = z.designFactor;
  const allowed = r3(1 / N);
  const running = (keeps: boolean | undefined, factor: number | undefined) =>
    keeps === undefined ? 'the running torque is unknown, so normal running is not checked' : `under the running torque it keeps ${r3(factor!)} on shear yield with kt`;
  const present: Candidate = {
    option: 'present',
    flags: z.scaleSide.needed ? ['does not keep the factor'] : runningFlags(z.present.running.keeps),
    why: `the present sizes and material already keep N = ${r3(N)} in a repeat of the incident (stress / shear yield ${r3(z.scaleSide.presentYieldRatio)} against ${allowed}); ${running(z.present.running.keeps, z.present.running.factorWithKt)}`,
  };
  // Only a material of the present shaft's family is a candidate, whatever its flags say.
  const families = new Set(z.results.case.shaft.segments.map((g) => materialFamily(z.results.case.materials[g.material])));
  const materials: Candidate[] = z.materials
    .filter((m) => families.has(materialFamily(m.material)))
    .map((m) => ({
      option: `material:${m.material.key}`,
      flags: m.flags,
      why: `${m.material.name} on the same drawing, the same family as the present shaft, keeps N = ${r3(N)} in a repeat of the incident (stress / shear yield ${r3(m.yieldRatio)} against ${allowed}); ${running(m.running.keeps, m.running.factorWithKt)}`,
    }));
  const k = z.criticalSegment;
  const critical: Candidate = {
    option: 'critical_segment',
    flags: k.flags,
    why: k.stockRerun
      ? `only the critical segment changes, and at its stock size side ${k.side} keeps N = ${r3(N)} (stress / shear yield ${r3(sideYieldRatio(k.stockRerun, k.side))} against ${allowed}); ${running(k.running?.keeps, k.running?.factorWithKt)}`
      : '',
  };
  const s = z.scaleSide;
  const scale: Candidate = {
    option: 'scale_side',
    flags: s.flags,
    why: `every segment of side ${s.side} scaled ×${r3(s.s)} (within analysis.max_scale ${r3(s.maxScale)}) keeps N = ${r3(N)} at the stock sizes (stress / shear yield ${r3(sideYieldRatio(s.stockRerun, s.side))} against ${allowed}); ${running(s.running.keeps, s.running.factorWithKt)}`,
  };
  const l = z.limiter;
  const limiter: Candidate = {
    option: 'limiter',
    flags: l.flags,
    why: `a torque limiter at "${l.station}" holds a repeat of the incident to a stress / shear yield of ${r3(l.yieldRatio)} against ${allowed} with the present sizes${l.min === undefined ? '; its lowest setting is not known until the running torque is' : ''}${s.practical ? '' : `, where the side would have to grow ×${r3(s.s)}, beyond analysis.max_scale ${r3(s.maxScale)}, for a shaft alone to survive`}`,
  };
  const combined = z.combined.map((o): Candidate => ({ option: o.option, flags: o.flags, why: combinedWhy(z, o, running) }));
  // The combinations are made only where no option alone passes (resizeCase), so they come last.
  const order = [...(s.practical ? [present, ...materials, critical, scale, limiter] : [present, limiter, ...materials, critical, scale]), ...combined];
  const pick = order.find((c) => c.flags.length === 0);
  return pick && { option: pick.option, reason: `${pick.why}. It is the least change by the rule that passes every check.` };
}

/** Why a combined option, in words: its ratio, and what the limiter alone lacked (what it combines is the change's to say). */
function combinedWhy(z: Omit<ResizeResult, 'recommended' | 'pickRule'>, o: ResizeResult['combined'][number], running: (keeps: boolean | undefined, factor: number | undefined) => string): string {
  const alone =
    z.limiter.flags.length > 0
      ? `, where the limiter alone at the top of its window does not (it ${z.limiter.flags[0]
          .split(/[:(]/)[0]
          .trim()
          .replace(/^its window is empty$/, 'has an empty window')
          .replace(/^does not/, 'does not')})`
      : '';
  const what = o.option === 'limiter_setting' ? 'a like-for-like shaft' : o.option === 'limiter_material' ? `a shaft of ${o.material!.key}, the same family as the present one,` : 'the larger pieces';
  return `with ${what} the ${o.limiters.length > 1 ? 'limiters hold' : 'limiter holds'} a repeat of the incident to a stress / shear yield of ${r3(o.yieldRatio)} against ${r3(1 / z.designFactor)}${alone}; ${running(o.running.keeps, o.running.factorWithKt)}`;
}

function runningFlags(keeps: boolean | undefined): string[] {
  return keeps === false ? ['fails in normal running'] : [];
}
