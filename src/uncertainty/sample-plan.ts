import type { Case } from '../case/case.ts';
import { keysOnPiece } from '../model/hub-seat.ts';
import { buildShaftModel } from '../model/shaft-model.ts';
import { kineticEnergy, reflectedInertia } from '../physics/inertia.ts';
import { PlasticBalance } from '../physics/plastic/plastic-balance.ts';
import { speedForPermanentTwist, type ReadBackSide } from '../physics/read-back.ts';
import { verdictShearStrength } from '../physics/shear-strength.ts';
import { compliance, shearStress, torqueForEnergy } from '../physics/torsion.ts';
import { sideEndSummary } from '../results/analyse-plastic.ts';
import { balancePiece } from '../results/side-balance.ts';
import { sampleCopy, type UncertainInput } from './inputs.ts';
import type { Metrics } from './monte-carlo.ts';

const EPS = 1e-9;

/**
 * The closed-form sampler set up once per case: a Monte Carlo varies values (speed, diameters,
 * bores, part dimensions, material properties), never lengths or positions, so the shaft's pieces,
 * their order, which stations load which side and which pieces lie between measured stations are
 * the same in every sample. They are found here once, in a copy of the case whose drawn fields
 * each sample sets in place (`UncertainInput.set`); a sample then runs only the arithmetic that
 * moves with the values: the energy method, the balance past yield, the read-back. The formulas
 * and their order are those of the single run (`energyMethodSide`, `sideBalance`,
 * `sideEndSummary`), so every sample's numbers are the ones the single run gives for its case
 * (test/uncertainty/sample-plan.test.ts holds them to the engine built case by case).
 *
 * `readBack` false: the speeds behind each measured twist are not sought (where the read-back
 * stands on the dynamic model, they are not shown).
 */
export function planSamples(c: Case, inputs: readonly UncertainInput[], readBack: boolean): (values: Float64Array) => Metrics {
  const w = sampleCopy(c);
  const model = buildShaftModel(w);
  const { criterion } = w.analysis;
  const sides = model.sides.map((side) => ({
    pieces: side.pieces,
    parts: side.stations.flatMap((s) => s.parts),
    // Which keys sit on each piece (positions never move; the keys are the copy's, set in place).
    keys: side.pieces.map((p) => keysOnPiece(w, p)),
  }));
  // For each measured twist, per side, the pieces between its stations (positions never move).
  const between = w.observed.permanentTwist.map((m) => {
    const at = m.between.map((name) => w.stations.find((s) => s.name === name)!.at);
    const [x1, x2] = [Math.min(...at), Math.max(...at)];
    return model.sides.map((side) => side.pieces.flatMap((p, j) => (p.start >= x1 - EPS && p.end <= x2 + EPS ? [j] : [])));
  });
  const explained = between.map((perSide) => perSide.some((b) => b.length > 0));

  return (values) => {
    for (let k = 0; k < inputs.length; k++) inputs[k].set(w, values[k]);
    const speed = w.speed;
    let yieldRatio = 0;
    let maxShearStress = 0;
    let peakTorque = 0;
    let permanentTwist = 0;
    const readBackSides: { balance: PlasticBalance; inertia: number }[] = [];
    for (const side of sides) {
      // The energy method (`energyMethodSide`), in its order of sums.
      let energy = 0;
      let inertia = 0;
      for (const part of side.parts) {
        const j = reflectedInertia(part.inertia, part.speedRatio) * part.count;
        energy += kineticEnergy(j, speed);
        inertia += j;
      }
      let pieceCompliance = 0;
      let couplings = 0;
      for (const p of side.pieces) {
        const seg = p.segment;
        pieceCompliance += compliance(p.end - p.start, w.materials[seg.material].shearModulus!, seg.diameter, seg.bore);
        couplings += seg.coupling?.stiffness ? 1 / seg.coupling.stiffness : 0;
      }
      const torque = torqueForEnergy(energy, pieceCompliance + couplings);
      for (const p of side.pieces) {
        const seg = p.segment;
        const tau = seg.kt * shearStress(torque, seg.diameter, seg.bore);
        yieldRatio = Math.max(yieldRatio, tau / verdictShearStrength(w.materials[seg.material], criterion));
        maxShearStress = Math.max(maxShearStress, tau);
      }
      // The balance past yield (`sideBalance` without the words the results show).
      const balance = new PlasticBalance(side.pieces.map((p, j) => balancePiece(w, p, side.keys[j])));
      const end = sideEndSummary(balance, energy);
      peakTorque = Math.max(peakTorque, end.torque);
      permanentTwist = Math.max(permanentTwist, end.permanentTwist);
      if (readBack) readBackSides.push({ balance, inertia });
    }
    if (!readBack) return { yieldRatio, maxShearStress, peakTorque, permanentTwist };
    const speedsForMeasured = w.observed.permanentTwist.map((m, k) => {
      if (!explained[k]) return undefined;
      const withBetween: ReadBackSide[] = readBackSides.map((s, i) => ({ ...s, between: between[k][i] }));
      return speedForPermanentTwist(withBetween, m.angle);
    });
    return { yieldRatio, maxShearStress, peakTorque, permanentTwist, speedsForMeasured };
  };
}
