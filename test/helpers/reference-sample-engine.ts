import type { Case } from '../../src/case/case.ts';
import { buildShaftModel } from '../../src/model/shaft-model.ts';
import { energyMethodSide } from '../../src/physics/energy-method.ts';
import { speedForPermanentTwist, type ReadBackSide } from '../../src/physics/read-back.ts';
import type { BalanceState } from '../../src/physics/plastic/plastic-balance.ts';
import { sideEndState, sidePermanentTwist } from '../../src/results/analyse-plastic.ts';
import { sideBalance, type SideBalance } from '../../src/results/side-balance.ts';
import type { Metrics } from '../../src/uncertainty/monte-carlo.ts';

const EPS = 1e-9;

/**
 * The closed-form sampler as it was before the per-case sample plan (`planSamples`), kept as the
 * reference the lean engine is held to: it rebuilds the shaft model and each side's energy method,
 * balance and end state from a case, by the single run's own functions. `readBack` false: no
 * speeds behind measured twists.
 */
export function referenceSampleMetrics(c: Case, readBack: boolean): Metrics {
  const model = buildShaftModel(c);
  let yieldRatio = 0;
  let maxShearStress = 0;
  let peakTorque = 0;
  let permanentTwist = 0;
  const readBackSides: ReadBackSide[] = [];
  for (const side of model.sides) {
    const e = energyMethodSide(side, c.speed, c.materials, c.analysis.criterion);
    for (const p of e.pieces) {
      yieldRatio = Math.max(yieldRatio, p.yieldRatio);
      maxShearStress = Math.max(maxShearStress, p.shearStress);
    }
    const inertia = e.parts.reduce((s, p) => s + p.reflectedInertia, 0);
    const b = sideBalance(side, c, inertia);
    const state = sideEndStateOnly(b, e.kineticEnergy);
    peakTorque = Math.max(peakTorque, state.torque);
    permanentTwist = Math.max(permanentTwist, sidePermanentTwist(state));
    readBackSides.push({ balance: b.balance, inertia, between: [] });
  }
  if (!readBack) return { yieldRatio, maxShearStress, peakTorque, permanentTwist };
  const speedsForMeasured = c.observed.permanentTwist.map((m) => {
    const at = m.between.map((name) => c.stations.find((s) => s.name === name)!.at);
    const [x1, x2] = [Math.min(...at), Math.max(...at)];
    const sides = model.sides.map((side, i) => ({
      ...readBackSides[i],
      between: side.pieces.flatMap((p, j) => (p.start >= x1 - EPS && p.end <= x2 + EPS ? [j] : [])),
    }));
    return sides.some((s) => s.between.length > 0) ? speedForPermanentTwist(sides, m.angle) : undefined;
  });
  return { yieldRatio, maxShearStress, peakTorque, permanentTwist, speedsForMeasured };
}

/**
 * The same end state without the fracture limit while the side is elastic unless it breaks there
 * (a brittle piece): the state that absorbs `energy` has a piece at its fracture twist rate exactly
 * when that energy reaches the limit (the energy grows with the twist rate of every piece), so the
 * limit is sought only then. The sampler's end state before the per-case plan (`sideEndSummary` now), kept as its reference.
 */
export function sideEndStateOnly(b: SideBalance, energy: number): BalanceState {
  // Past the elastic limit the fracture limit is cheaper than the root it may make needless.
  if (energy > b.balance.elasticLimitEnergy()) return sideEndState(b, energy).state;
  const state = b.balance.stateForEnergy(energy);
  return state.pieces.some((p) => p.fractured) ? sideEndState(b, energy).state : state;
}
