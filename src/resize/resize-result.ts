import type { Investigation } from '../finding/investigation.ts';
import type { CriticalSegmentOption } from './critical-segment.ts';
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
  scaleSide: ScaleSideOption & OptionEffects;
  criticalSegment: CriticalSegmentOption & Partial<OptionEffects>;
  materials: (MaterialOption & OptionEffects)[];
  limiter: LimiterOption & { running: RunningCheck };
  keys: KeyFuse[];
  ratedSpeed: RatedSpeedCheck[];
  guarding: Recommendation[];
  /** The stock-size series used, in words. */
  stockSeries: string;
  /** What every option's numbers rest on, in plain sentences. */
  notes: string[];
  cautions: readonly string[];
}
