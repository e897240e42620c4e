import type { Case } from '../case/case.ts';
import { sideModes } from '../model/chain-modes.ts';
import { buildChain } from '../model/chain.ts';
import { buildShaftModel, type SideName } from '../model/shaft-model.ts';
import { energyMethodSide, type SideResult } from '../physics/energy-method.ts';
import { analyseCase } from '../results/analyse-case.ts';
import type { Results } from '../results/results.ts';

/**
 * The engine run on a changed case, as a design check that needs the time history (the limiter's
 * slip): does the changed shaft stay below yield with the design factor? The dynamic model's shaft
 * elements are kept elastic here (`dynamic_plasticity: false`): where the changed shaft stays
 * elastic the elastic model is the same result, and where it would yield the option fails either
 * way, with the elastic stress / shear yield saying by how much (a yielding model would cap it). No twist
 * read-back is made.
 */
export function designRun(c: Case): Results {
  return analyseCase({ ...c, analysis: { ...c.analysis, dynamicPlasticity: false } }, { readBack: false });
}

/**
 * What a design option's rerun is read for: the elastic energy method per side (its yield ratios
 * and peak torques, what `resize` judges by) and the dynamic model's natural frequencies with the
 * stop held (the frequency change where the verdict stands on the dynamic model). The fields are
 * those of `Results`, so a full `analyseCase` result serves wherever a design check does.
 */
export interface DesignCheck {
  case: Case;
  sides: SideResult[];
  /** Highest yield ratio over every side, the energy method's (as `Results.yieldRatio`). */
  yieldRatio: number;
  /** The dynamic model's natural frequencies with the stop held, Hz (found when first read). */
  readonly dynamic: { frequencies: { side: SideName; frequency: number; participation: number }[] };
}

/** Modes kept per side and overall, as the dynamic model keeps them (src/results/dynamic-solve.ts, dynamic-result.ts). */
const MODES_PER_SIDE = 12;
const MODES_KEPT = 10;
/**
 * Shaft elements of the chain whose modes a design check takes: the most the dynamic model's
 * refinement goes to. Modes alone cost little at this count, and the lowest frequencies of the
 * sample cases' options are settled there (to 0.02 % against four times as many elements).
 */
const MODE_ELEMENTS = 96;

/**
 * The design check of a changed case without a time integration: the energy method, and the modes
 * of the dynamic model's chain with the stop held, at the case's `analysis.elements` where it sets
 * them, else at `MODE_ELEMENTS` (one element per piece where the shaft's inertia is left out, as
 * the dynamic model does). A full rerun would integrate in time only to read these.
 */
export function designCheck(c: Case): DesignCheck {
  let dynamic: DesignCheck['dynamic'] | undefined;
  return {
    ...energyCheck(c),
    // The modes are found when first read: only where the verdict stands on the dynamic model,
    // and only for the options whose frequency change is shown.
    get dynamic() {
      dynamic ??= { frequencies: designModes(c) };
      return dynamic;
    },
  };
}

function designModes(c: Case): DesignCheck['dynamic']['frequencies'] {
  const model = buildShaftModel(c);
  const shaftInertia = c.analysis.shaftInertia && c.shaft.segments.every((s) => c.materials[s.material].density !== undefined);
  const pieceCount = buildChain(c, model, { elements: 1, shaftInertia: false }).pieces.length;
  const target = !shaftInertia ? pieceCount : (c.analysis.elements ?? MODE_ELEMENTS);
  const modes = sideModes(buildChain(c, model, { elements: target, shaftInertia }), MODES_PER_SIDE);
  return modes.slice(0, MODES_KEPT).map((m) => ({ side: m.side, frequency: m.frequency, participation: m.participation }));
}

/** The energy method alone on a changed case: what a search over a size reads. */
export function energyCheck(c: Case): Omit<DesignCheck, 'dynamic'> {
  const sides = buildShaftModel(c).sides.map((side) => energyMethodSide(side, c.speed, c.materials, c.analysis.criterion));
  let yieldRatio = sides[0].pieces[0].yieldRatio;
  for (const s of sides) for (const p of s.pieces) yieldRatio = Math.max(yieldRatio, p.yieldRatio);
  return { case: c, sides, yieldRatio };
}
