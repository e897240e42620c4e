import type { Investigation } from '../finding/investigation.ts';
import type { CombinedId, CombinedOption } from './combined-options.ts';
import type { CriticalSegmentOption } from './critical-segment.ts';
import type { FuseOrder } from './fuse-order.ts';
import type { Recommendation } from './guarding.ts';
import type { KeyFuse } from './key-fuse.ts';
import type { MaterialOption } from './other-materials.ts';
import type { RatedSpeedCheck } from './rated-speed.ts';
import type { RunningCheck } from './running-check.ts';
import type { ScaleSideOption } from './scale-side.ts';
import type { StiffnessChange } from './stiffness-change.ts';
import type { LimiterOption } from './torque-limiter.ts';

/** What an option does in normal running and to the side's stiffness. */
export interface OptionEffects {
  running: RunningCheck;
  change: StiffnessChange;
}

/** Plain-word reasons an option is not advisable, each with its numbers; empty where there is none (src/resize/option-flags.ts). */
export interface Flagged {
  flags: string[];
}

/**
 * An option as the result names it: `present` (the present sizes and material), `scale_side`,
 * `critical_segment`, `material:<key>` (one of `materials`, by its key), `limiter`, or a combined
 * option (`limiter_setting`, `limiter_material`, `limiter_segments`, one of `combined`), the names
 * of the JSON's blocks. A key is never picked (it is no dependable fuse), so it has no id.
 */
export type OptionId = 'present' | 'scale_side' | 'critical_segment' | 'limiter' | `material:${string}` | CombinedId;

/** The option the rule picks (src/resize/recommend.ts), with why. */
export interface Recommended {
  option: OptionId;
  reason: string;
}

/**
 * What could go back in, each option checked against a repeat of the recorded incident by a rerun
 * of the changed case, and in normal running. Every view (table, JSON, report section) reads this.
 */
export interface ResizeResult {
  /** The check of the case as it is, with its finding. */
  results: Investigation;
  /** Design factor N on shear yield a replacement keeps in a repeat incident. */
  designFactor: number;
  serviceFactor: number;
  maxScale: number;
  /** The present shaft in normal running. */
  present: { running: RunningCheck };
  scaleSide: ScaleSideOption & OptionEffects & Flagged;
  criticalSegment: CriticalSegmentOption & Partial<OptionEffects> & Flagged;
  materials: (MaterialOption & OptionEffects & Flagged)[];
  limiter: LimiterOption & { running: RunningCheck; fuses: FuseOrder } & Flagged;
  keys: (KeyFuse & Flagged)[];
  /** A limiter at a stated setting with the present or a stronger shaft (src/resize/combined-options.ts), where they differ from the single options. */
  combined: (CombinedOption & Flagged)[];
  /** The one option the rule picks; undefined where every option has a flag. */
  recommended: Recommended | undefined;
  /** The rule of the pick, in words (`PICK_RULE`). */
  pickRule: string;
  ratedSpeed: RatedSpeedCheck[];
  guarding: Recommendation[];
  /** The stock-size series used, in words. */
  stockSeries: string;
  /** What every option's numbers rest on, in plain sentences. */
  notes: string[];
  cautions: readonly string[];
}
