import type { Case } from '../case/case.ts';
import { buildShaftModel } from '../model/shaft-model.ts';
import { energyMethodSide } from '../physics/energy-method.ts';
import { analysePlastic } from './analyse-plastic.ts';
import { CAUTIONS } from './cautions.ts';
import { readFracture } from './fracture-reading.ts';
import type { ElasticVerdict, Results, Verdict } from './results.ts';
import { readTwistBack } from './twist-findings.ts';

/** Share of a side's energy above which the shaft's own kinetic energy is worth a warning. */
const SHAFT_ENERGY_WARNING = 0.05;

/** Runs the engine on a checked case. Pure: no I/O, no clock. */
export function analyseCase(c: Case): Results {
  const model = buildShaftModel(c);
  const warnings: string[] = [];
  const sides = model.sides.map((side) => energyMethodSide(side, c.speed, c.materials, c.analysis.criterion));

  for (const s of model.atStop) {
    warnings.push(`Station "${s.name}" stands at the stop itself; its parts release no energy into the shaft and are left out.`);
  }
  for (const side of sides) {
    if (side.stations.length > 1) {
      warnings.push(
        `Side ${side.side} has ${side.stations.length} stations with parts (${side.stations.join(', ')}); the energy method puts all their energy through the whole run of shaft and is approximate here.`,
      );
    }
    if (side.shaftKineticEnergy === undefined) {
      warnings.push(`Side ${side.side}: the shaft's own kinetic energy is not estimated because a shaft material has no density.`);
    } else if (side.shaftKineticEnergy > SHAFT_ENERGY_WARNING * side.kineticEnergy) {
      const pct = (100 * side.shaftKineticEnergy) / side.kineticEnergy;
      warnings.push(
        `Side ${side.side}: the shaft's own kinetic energy is ${pct.toFixed(0)} % of the parts' energy and is not included (as in the hand method); the result may be low.`,
      );
    }
  }
  if (c.stop.duration > 0) {
    warnings.push(`The stop took ${(c.stop.duration * 1000).toPrecision(3)} ms; the energy method treats it as instantaneous, which overestimates the torque.`);
  }

  let governing = { side: sides[0], piece: sides[0].pieces[0] };
  for (const side of sides) {
    for (const piece of side.pieces) if (piece.yieldRatio > governing.piece.yieldRatio) governing = { side, piece };
  }
  const maxShearStress = Math.max(...sides.flatMap((s) => s.pieces.map((p) => p.shearStress)));
  const elasticVerdict: ElasticVerdict = governing.piece.yieldRatio < 1 ? 'elastic' : 'yielded';

  const { plastic, balances, warnings: plasticWarnings } = analysePlastic(c, model, sides);
  warnings.push(...plasticWarnings);
  if (elasticVerdict === 'yielded' && plastic.verdict === 'elastic') {
    warnings.push('The net section stays elastic, but the stress at a stress raiser (kt) passes yield: local yielding there, no measurable permanent twist; the spot matters for fatigue.');
  }
  const verdict: Verdict = plastic.verdict === 'elastic' ? elasticVerdict : plastic.verdict;
  const observedFindings = { twist: readTwistBack(c, model.sides, balances), fracture: readFracture(c, plastic) };

  return {
    case: c,
    speed: c.speed,
    sides,
    kineticEnergy: sides.reduce((sum, s) => sum + s.kineticEnergy, 0),
    governing,
    maxShearStress,
    yieldRatio: governing.piece.yieldRatio,
    verdict,
    elasticVerdict,
    plastic,
    observedFindings,
    warnings,
    cautions: CAUTIONS,
  };
}
