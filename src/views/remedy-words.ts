import type { OptionId, ResizeResult } from '../resize/resize-result.ts';
import { sideYieldRatio } from '../resize/side-ratio.ts';
import { sig } from './display-units.ts';
import { recommendedChange } from './resize-words.ts';

/** The remedy the first page recommends: resize's pick in words, its key figure and why that one. */
export interface RemedyWords {
  option: OptionId;
  /** What to do, with its sizes or setting (resize's own words for the pick). */
  action: string;
  /** Its repeat-incident stress / shear yield against the allowed 1/N. */
  figure: string;
  /** Why this one (resize's reason). */
  why: string;
}

/** An option's repeat-incident stress / shear yield, from its rerun in the resize result. */
function repeatRatio(z: ResizeResult, id: OptionId): number {
  if (id === 'present') return z.scaleSide.presentYieldRatio;
  if (id === 'scale_side') return sideYieldRatio(z.scaleSide.stockRerun, z.scaleSide.side);
  if (id === 'critical_segment') return sideYieldRatio(z.criticalSegment.stockRerun!, z.criticalSegment.side);
  if (id === 'limiter') return z.limiter.yieldRatio;
  const o = z.combined.find((x) => x.option === id);
  if (o) return o.yieldRatio;
  return z.materials.find((m) => `material:${m.material.key}` === id)!.yieldRatio;
}

/** The pick of `resize` (z.recommended, decided there), in the first page's words; undefined where resize picks none. */
export function recommendedRemedy(z: ResizeResult): RemedyWords | undefined {
  const p = z.recommended;
  if (!p) return undefined;
  const replace = z.results.finding.action === 'replace' && (p.option === 'limiter' || p.option === 'limiter_setting') ? 'Replace the shaft and ' : '';
  const change = recommendedChange(z, p.option).replace(/\.$/, '');
  return {
    option: p.option,
    action: replace ? `${replace}${change}` : change.charAt(0).toUpperCase() + change.slice(1),
    figure: `repeat-incident stress / shear yield ${sig(repeatRatio(z, p.option))} against the ${sig(1 / z.designFactor)} allowed`,
    why: p.reason,
  };
}
