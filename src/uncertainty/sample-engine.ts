import type { Case } from '../case/case.ts';
import { buildShaftModel } from '../model/shaft-model.ts';
import { energyMethodSide } from '../physics/energy-method.ts';
import { speedForPermanentTwist, type ReadBackSide } from '../physics/read-back.ts';
import { sideEndStateOnly, sidePermanentTwist } from '../results/analyse-plastic.ts';
import { sideBalance } from '../results/side-balance.ts';
import type { Metrics } from './monte-carlo.ts';

const EPS = 1e-9;

/**
 * The engine a Monte Carlo sample runs: the same functions as the single run (energy method,
 * energy balance past yield, reading measured twist back), without what only the report needs
 * (figure curves, texts). `analyseCase` gives the same numbers; a test says so.
 */
export function sampleMetrics(c: Case): Metrics {
  return sampleMetricsOf(c, true);
}

/**
 * The same without reading measured twist back (`readBack` false): where the read-back stands on
 * the dynamic model, the energy balance's speeds behind a twist are not shown, so they are not
 * sought in every sample.
 */
export function sampleMetricsOf(c: Case, readBack: boolean): Metrics {
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
