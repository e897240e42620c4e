import { materialFamily } from '../materials/material-family.ts';
import type { SideName } from '../model/shaft-model.ts';
import type { CombinedOption } from './combined-options.ts';
import type { KeyFuse } from './key-fuse.ts';
import type { ResizeResult } from './resize-result.ts';
import type { RunningCheck } from './running-check.ts';
import { sideYieldRatio } from './side-ratio.ts';

// Why an option is not advisable, in plain words with its numbers: the reasons the pick
// (src/resize/recommend.ts) passes an option over, and what every view prints beside it. Ratios are
// given to three significant figures; torques and sizes are the views' to show in the case's units.

/** A resize result before its options are flagged and one is picked. */
export type Unflagged = Omit<ResizeResult, 'scaleSide' | 'criticalSegment' | 'materials' | 'limiter' | 'keys' | 'combined' | 'recommended' | 'pickRule'> & {
  [K in 'scaleSide' | 'criticalSegment' | 'limiter']: Omit<ResizeResult[K], 'flags'>;
} & { materials: Omit<ResizeResult['materials'][number], 'flags'>[]; keys: KeyFuse[]; combined: CombinedOption[] };

/** Relative slack on "keeps the factor": a ratio at 1/N to rounding is within it. */
const SLACK = 1e-9;

const r3 = (x: number) => String(Number(x.toPrecision(3)));

/** A ratio and the limit it is compared with, to as many figures as it takes to tell them apart (up to 6). */
function against(x: number, limit: number): [string, string] {
  for (let p = 3; p < 6; p++) if (Number(x.toPrecision(p)) !== Number(limit.toPrecision(p))) return [String(Number(x.toPrecision(p))), String(Number(limit.toPrecision(p)))];
  return [String(Number(x.toPrecision(6))), String(Number(limit.toPrecision(6)))];
}

/** "fails its own design factor: …" where a repeat-incident stress / shear yield is past 1/N. */
function factorFlag(yieldRatio: number, designFactor: number): string[] {
  if (yieldRatio * designFactor <= 1 + SLACK) return [];
  const [x, limit] = against(yieldRatio, 1 / designFactor);
  return [`fails its own design factor: a repeat of the incident takes it to a stress / shear yield of ${x}, above the ${limit} that N = ${r3(designFactor)} allows`];
}

/** "fails in normal running: …" where the running torque is known and the factor with kt is below N. */
function runningFlag(r: RunningCheck | undefined, designFactor: number): string[] {
  if (!r || r.keeps !== false) return [];
  return [`fails in normal running: under the running torque it keeps a factor of ${r3(r.factorWithKt!)} on shear yield with kt, below N = ${r3(designFactor)}`];
}

/** Each other side of the stop that a change leaves past the factor. */
function otherSidesFlag(rerun: Parameters<typeof sideYieldRatio>[0], side: SideName, designFactor: number): string[] {
  return rerun.sides
    .filter((s) => s.side !== side && sideYieldRatio(rerun, s.side) * designFactor > 1 + SLACK)
    .map((s) => `leaves side ${s.side} of the stop at a stress / shear yield of ${r3(sideYieldRatio(rerun, s.side))}, past the factor: that side needs its own remedy`);
}

/** Every option of the result with its flags. Pure: the input is not changed. */
export function withFlags(z: Unflagged): Omit<ResizeResult, 'recommended' | 'pickRule'> {
  const N = z.designFactor;
  const s = z.scaleSide;
  const scaleFlags = [
    ...(s.needed ? [] : [`not needed: the present shaft already keeps the factor (s = ${r3(s.s)} is 1 or less)`]),
    ...(s.practical ? [] : [`impractical: every diameter of side ${s.side} would grow ×${r3(s.s)}, beyond analysis.max_scale ${r3(s.maxScale)}; no bearing, hub or housing of the machine takes that`]),
    ...factorFlag(sideYieldRatio(s.stockRerun, s.side), N),
    ...runningFlag(s.running, N),
    ...otherSidesFlag(s.stockRerun, s.side, N),
  ];

  const k = z.criticalSegment;
  const criticalFlags =
    k.verdict === 'others-critical'
      ? [`no size of this segment alone works: where it reaches ${r3(1 / N)} the stiffer shaft raises the torque and the rest of side ${k.side} reaches ${r3(k.othersAtOwn)}`]
      : [
          ...(k.verdict === 'present-keeps' ? [`not needed: the segment already keeps the factor (stress / shear yield ${r3(k.presentYieldRatio)})`] : []),
          ...factorFlag(sideYieldRatio(k.stockRerun!, k.side), N),
          ...runningFlag(k.running, N),
          ...otherSidesFlag(k.stockRerun!, k.side, N),
        ];

  const presentFamilies = new Set(z.results.case.shaft.segments.map((g) => materialFamily(z.results.case.materials[g.material])));
  const materials = z.materials.map((m) => {
    const family = materialFamily(m.material);
    const present = [...presentFamilies].filter((f) => f !== undefined).join(', ');
    const otherFamily = family !== undefined && present !== '' && !presentFamilies.has(family);
    return {
      ...m,
      flags: [
        ...factorFlag(m.yieldRatio, N),
        ...runningFlag(m.running, N),
        ...(otherFamily
          ? [
              `another family of material (${family}) than the present shaft (${present}): its stiffness, fits, keyways, fatigue and corrosion behaviour differ, so it is no replacement on the same drawing without the machine builder's or an engineer's word`,
            ]
          : []),
      ],
    };
  });

  const l = z.limiter;
  const limiterFlags = [
    ...(l.windowEmpty ? ['its window is empty: the lowest setting that runs the machine is above the highest that protects the shaft'] : []),
    ...factorFlag(l.yieldRatio, N).map((f) =>
      l.slip.stopWave ? `${f} (the instantaneous stop's stress wave in ${l.slip.stopWave.piece}, which no limiter cuts; a stop spread over a few milliseconds brings it near the setting)` : f,
    ),
    ...runningFlag(l.running, N),
    ...(l.unlimitedStations.length > 0 ? [`the parts at ${l.unlimitedStations.map((n) => `"${n}"`).join(', ')} lie between it and the stop and still drive the shaft unlimited`] : []),
    ...l.otherSides.filter((o) => o.yieldRatio * N > 1 + SLACK).map((o) => `does not protect side ${o.side} of the stop (stress / shear yield ${r3(o.yieldRatio)}): that side needs its own`),
  ];

  const keys = z.keys.map((key) => ({
    ...key,
    flags: [
      ...(key.shearsBeforeShaftYields ? [] : [`does not shear before the shaft yields: it shears off at ${r3(key.shearOffTorque / key.shaftYieldTorque)} × the torque at which the shaft yields`]),
      "a key is no dependable fuse: fit, fretting, wear and the hub's grip change the torque it fails at, and a sheared key can wedge and keep driving",
    ],
  }));

  const combined = z.combined.map((o) => ({ ...o, flags: combinedFlags(o, N, z.maxScale) }));

  return { ...z, scaleSide: { ...s, flags: scaleFlags }, criticalSegment: { ...k, flags: criticalFlags }, materials, limiter: { ...l, flags: limiterFlags }, keys, combined };
}

/** A combined option's flags, by the rules of the single options: its factor in a repeat and in running, each limiter's window and reach, a segment grown past max_scale. */
function combinedFlags(o: CombinedOption, designFactor: number, maxScale: number): string[] {
  const wave = o.limiters.find((l) => l.slip.stopWave && l.yieldRatio * designFactor > 1 + SLACK)?.slip.stopWave;
  return [
    ...o.segments
      .filter((g) => g.growth > maxScale + SLACK)
      .map(
        (g) =>
          `impractical: ${g.segment.label ? `"${g.segment.label}"` : `segment ${g.segment.index + 1}`} would grow ×${r3(g.growth)}, beyond analysis.max_scale ${r3(maxScale)}; no bearing, hub or housing of the machine takes that`,
      ),
    ...factorFlag(o.yieldRatio, designFactor).map((f) => (wave ? `${f} (the instantaneous stop's stress wave in ${wave.piece}, which no limiter cuts)` : f)),
    ...runningFlag(o.running, designFactor),
    ...o.limiters.flatMap((l) => [
      ...(l.min !== undefined && l.setting < l.min * (1 - SLACK) ? [`the limiter at "${l.station}" is set below the lowest setting that runs the machine (the running torque × service factor)`] : []),
      ...(l.setting > l.max * (1 + SLACK) ? [`the limiter at "${l.station}" is set above what the shaft from there to the stop allows at N = ${r3(designFactor)}`] : []),
      ...(l.unlimitedStations.length > 0
        ? [`the parts at ${l.unlimitedStations.map((n) => `"${n}"`).join(', ')} lie between the limiter at "${l.station}" and the stop and still drive the shaft unlimited`]
        : []),
    ]),
    ...o.otherSides
      .filter((s) => s.yieldRatio * designFactor > 1 + SLACK)
      .map((s) => `does not protect side ${s.side} of the stop (stress / shear yield ${r3(s.yieldRatio)}): that side needs its own`),
  ];
}
