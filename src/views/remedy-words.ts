import type { ResizeResult } from '../resize/resize-result.ts';
import { sideYieldRatio } from '../resize/side-ratio.ts';
import { show, sig } from './display-units.ts';
import { segName } from './resize-words.ts';
import { showDiameter } from './show-diameter.ts';

/** The options `resize` weighs, by kind. */
export type RemedyKind = 'scale side' | 'critical segment' | 'material' | 'torque limiter' | 'key';

/** The remedy the first page recommends, in words, with its key figure and why that one. */
export interface RemedyWords {
  kind: RemedyKind;
  /** What to do, with its key figure: "fit a torque limiter at "drive sheave" set at 3.03 kN·m (window 1.5–3.03 kN·m)". */
  action: string;
  /** Its repeat-incident stress / shear yield against the allowed 1/N, in words. */
  figure: string;
  /** Why this one. */
  why: string;
  /** Whether it keeps the design factor in a repeat of the incident. */
  keepsFactor: boolean;
}

/** An option's repeat-incident stress / shear yield, and whether it is one a plant can fit (a scale within max_scale, a window that is not empty, a key that shears first). */
function optionStanding(z: ResizeResult, kind: RemedyKind): { ratio: number; practical: boolean } | undefined {
  const side = z.results.governing.side.side;
  switch (kind) {
    case 'scale side':
      return z.scaleSide.needed ? { ratio: sideYieldRatio(z.scaleSide.stockRerun, z.scaleSide.side), practical: z.scaleSide.practical } : undefined;
    case 'critical segment':
      return z.criticalSegment.verdict === 'fits' && z.criticalSegment.stockRerun ? { ratio: sideYieldRatio(z.criticalSegment.stockRerun, side), practical: true } : undefined;
    case 'material': {
      const m = z.materials.find((x) => x.keepsFactor) ?? z.materials[0];
      return m ? { ratio: m.yieldRatio, practical: true } : undefined;
    }
    case 'torque limiter':
      return z.limiter.windowEmpty ? undefined : { ratio: z.limiter.yieldRatio, practical: true };
    case 'key':
      return undefined; // a key is a poor fuse (resize says why): never the recommended remedy
  }
}

const ORDER: readonly RemedyKind[] = ['critical segment', 'material', 'scale side', 'torque limiter'];

/**
 * The option the first page names: resize's own pick where it makes one; until then the first
 * practical option, from the least change (one segment, then the material, then the whole side)
 * to a limiter, that keeps the design factor in a repeat of the incident, and where none does the
 * practical one that comes closest, said as falling short.
 */
export function recommendedRemedy(z: ResizeResult): RemedyWords | undefined {
  const allowed = 1 / z.designFactor;
  const standing = ORDER.flatMap((kind) => {
    const s = optionStanding(z, kind);
    return s && s.practical ? [{ kind, ratio: s.ratio }] : [];
  });
  const keeps = standing.find((s) => s.ratio <= allowed * (1 + 1e-9));
  const pick = keeps ?? [...standing].sort((a, b) => a.ratio - b.ratio)[0];
  if (!pick) return undefined;
  const why = keeps
    ? `the least change, of the options resize checks, that keeps the design factor N = ${sig(z.designFactor)} in a repeat of the incident`
    : `no practical option keeps the design factor N = ${sig(z.designFactor)} in a repeat of the incident; this one comes closest, so the engineer decides whether to accept it or to change the machine further`;
  return { kind: pick.kind, action: remedyAction(z, pick.kind), figure: `repeat-incident stress / shear yield ${sig(pick.ratio)} against the ${sig(allowed)} allowed`, why, keepsFactor: keeps !== undefined };
}

/** What to do for an option, with its key figure, from the resize result only. */
export function remedyAction(z: ResizeResult, kind: RemedyKind): string {
  const r = z.results;
  const u = r.case.units;
  const replace = r.finding.action === 'replace' ? 'replace the shaft like for like (present sizes and material) and ' : '';
  switch (kind) {
    case 'critical segment': {
      const k = z.criticalSegment;
      return `replace the shaft with ${segName(k.segment)} at Ø${showDiameter(k.stockDiameter!, u)} (now Ø${showDiameter(k.segment.diameter, u)}), the rest as it is`;
    }
    case 'material': {
      const m = z.materials.find((x) => x.keepsFactor) ?? z.materials[0];
      return `replace the shaft in ${m.material.name} (${m.material.key}), same sizes`;
    }
    case 'scale side': {
      const s = z.scaleSide;
      const sizes = s.segments.map((g, i) => `${segName(g)} Ø${showDiameter(s.stockDiameters[i], u)}`).join(', ');
      return `replace the shaft with side ${s.side} scaled ×${sig(s.s)}: ${sizes}`;
    }
    case 'torque limiter': {
      const l = z.limiter;
      const window = l.min === undefined ? `at most ${show(l.max, 'torque', u)}; the lower end is unknown without a running torque` : `window ${show(l.min, 'torque', u)} to ${show(l.max, 'torque', u)}`;
      return `${replace}fit a torque limiter at "${l.station}" set at ${show(l.slip.setting, 'torque', u)} (${window}); a repeat incident then peaks at ${show(l.slip.peakTorque, 'torque', u)} between it and the stop`;
    }
    case 'key': {
      const k = z.keys[0];
      return `${replace}rely on the key at "${k.station}" as a fuse (it shears at about ${show(k.shearOffTorque, 'torque', u)})`;
    }
  }
}

