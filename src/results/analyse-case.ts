import type { Case } from '../case/case.ts';
import { buildShaftModel } from '../model/shaft-model.ts';
import { energyMethodSide, type PieceResult, type SideResult } from '../physics/energy-method.ts';
import { compliance } from '../physics/torsion.ts';
import { analysePlastic } from './analyse-plastic.ts';
import { CAUTIONS } from './cautions.ts';
import { dynamicResult, firstBrokenPiece, type DynamicResult } from './dynamic-result.ts';
import { dynamicTwistRelation } from './dynamic-twist-relation.ts';
import { balanceFracturePrediction, readFracture, type FracturePrediction } from './fracture-reading.ts';
import { balancePieceOf, type PlasticResult } from './plastic-result.ts';
import type { ElasticVerdict, Results, Verdict } from './results.ts';
import { balanceTwistRelation, readTwistBack } from './twist-findings.ts';
import { verdictBasis } from './verdict-basis.ts';
import { hubFits } from './hub-fits.ts';
import { keyChecks } from './key-checks.ts';
import { couplingChecks } from './coupling-checks.ts';
import { driveTrainElements } from './drive-train.ts';
import { gearboxChecks } from './gearbox-checks.ts';
import { backstopChecks } from './backstop-checks.ts';

/** Share of a side's energy above which the shaft's own kinetic energy is worth a warning. */
const SHAFT_ENERGY_WARNING = 0.05;

/** What a run may leave out. */
export interface AnalyseOptions {
  /**
   * false: no twist read-back (a rerun inside `resize` or the uncertainty run, which reads no
   * observations and would otherwise pay for the dynamic model's inversion).
   */
  readBack?: boolean;
  /**
   * The dynamic model's shaft elements, fixed at this count instead of refined (as
   * `analysis.elements` would): a Monte Carlo sample takes the base run's `dynamic.elementTarget`
   * rather than paying for a refinement of its own, since its inputs move the peaks by far less
   * than the refinement tolerance moves them.
   */
  elements?: number;
}

const LOCAL_YIELD = 'The net section stays elastic, but the stress at a stress raiser (kt) passes yield: local yielding there, no measurable permanent twist; the spot matters for fatigue.';

/** Runs the engine on a checked case. Pure: no I/O, no clock. */
export function analyseCase(c: Case, opts: AnalyseOptions = {}): Results {
  const model = buildShaftModel(c);
  const warnings: string[] = [...(c.materialWarnings ?? [])];
  const sides = model.sides.map((side) => energyMethodSide(side, c.speed, c.materials, c.analysis.criterion));
  const dynamic = dynamicResult(opts.elements === undefined ? c : { ...c, analysis: { ...c.analysis, elements: opts.elements } }, model, sides);
  const basis = verdictBasis(c, sides);

  for (const s of model.atStop) {
    warnings.push(`Station "${s.name}" stands at the stop itself; its parts release no energy into the shaft and are left out.`);
  }
  for (const side of sides) {
    if (side.stations.length > 1) {
      const d = dynamic.sides.find((x) => x.side === side.side)!;
      warnings.push(
        `Side ${side.side} has ${side.stations.length} stations with parts (${side.stations.join(', ')}); the energy method puts all their energy through the whole run of shaft and is approximate here; the dynamic model resolves them (peak torque ${fmt(d.dynamicPeakTorque)} N·m against ${fmt(d.energyPeakTorque)} N·m) and the verdict uses it.`,
      );
    }
    if (side.shaftKineticEnergy === undefined) {
      warnings.push(`Side ${side.side}: the shaft's own kinetic energy is not estimated because a shaft material has no density.`);
    } else if (side.shaftKineticEnergy > SHAFT_ENERGY_WARNING * side.kineticEnergy) {
      const pct = (100 * side.shaftKineticEnergy) / side.kineticEnergy;
      warnings.push(
        `Side ${side.side}: the shaft's own kinetic energy is ${pct.toFixed(0)} % of the parts' energy and is not included in the energy method (as in the hand method); the result may be low. ${dynamic.shaftInertia ? 'The dynamic model includes it.' : 'The dynamic model leaves it out too.'}`,
      );
    }
  }
  if (c.stop.duration > 0) {
    warnings.push(
      `The stop took ${(c.stop.duration * 1000).toPrecision(3)} ms; the energy method treats it as instantaneous, which overestimates the torque; the dynamic model follows the stop's ramp and the verdict uses it.`,
    );
  }
  for (const s of dynamic.slips) {
    if (s.slippingAtEnd)
      warnings.push(`${capitalise(s.element)} was still slipping when the simulated window ended (${(dynamic.duration * 1000).toPrecision(3)} ms); its slip energy and angle are to that moment.`);
  }
  warnings.push(...dynamic.notes);

  let governing = { side: sides[0], piece: sides[0].pieces[0] };
  for (const side of sides) {
    for (const piece of side.pieces) if (piece.yieldRatio > governing.piece.yieldRatio) governing = { side, piece };
  }
  const maxShearStress = Math.max(...sides.flatMap((s) => s.pieces.map((p) => p.shearStress)));
  const elasticVerdict: ElasticVerdict = governing.piece.yieldRatio < 1 ? 'elastic' : 'yielded';
  // The verdict's elastic check stands on the dynamic model where the energy method is not exact;
  // governing, maxShearStress and yieldRatio stay the energy method's (the JSON contract's keys).
  const verdictGoverning = basis.basis === 'dynamic model' ? dynamicGoverning(c, sides, dynamic) : governing;
  const basisVerdict: ElasticVerdict = verdictGoverning.piece.yieldRatio < 1 ? 'elastic' : 'yielded';

  const { plastic, balances, warnings: plasticWarnings } = analysePlastic(c, model, sides);
  warnings.push(...plasticWarnings);
  // Where the verdict stands on the dynamic model and its shaft elements yield and break, the
  // verdict past yield is the dynamic model's too; otherwise the energy balance's.
  const pastYieldInTime = basis.basis === 'dynamic model' && dynamic.plasticity;
  let verdict: Verdict;
  if (pastYieldInTime) {
    verdict = dynamic.fractured ? 'fracture predicted' : dynamic.yielded || basisVerdict === 'yielded' ? 'yielded' : 'elastic';
    if (basisVerdict === 'yielded' && !dynamic.yielded && !dynamic.fractured) warnings.push(LOCAL_YIELD);
    const netSection = dynamic.fractured ? 'fracture predicted' : dynamic.yielded ? 'yielded' : 'elastic';
    if (plastic.verdict !== netSection) {
      warnings.push(
        `The energy balance past yield, which puts all of each side's energy into its shaft with nothing else acting, gives "${plastic.verdict}"; the verdict follows the dynamic model, which follows the slip, the drive and the stop in time with the same elastic–plastic law, and the balance's figures are shown for comparison only.`,
      );
    }
  } else if (basis.basis === 'dynamic model' && basisVerdict === 'elastic') {
    // The dynamic model (slip, drive, ramp, several masses) keeps every segment below yield; the
    // energy balance past yield puts all the energy into the shaft and does not apply.
    verdict = 'elastic';
    if (plastic.verdict !== 'elastic') {
      warnings.push(
        'The energy balance past yield (all the energy into the shaft) predicts yield, but the dynamic model, which follows the slip, the drive and the stop in time, keeps every segment elastic; the verdict follows the dynamic model, and the past-yield figures are an upper bound.',
      );
    }
  } else {
    if (basisVerdict === 'yielded' && plastic.verdict === 'elastic') warnings.push(LOCAL_YIELD);
    verdict = plastic.verdict === 'elastic' ? basisVerdict : plastic.verdict;
    if (basis.basis === 'dynamic model' && plastic.verdict !== 'elastic') {
      warnings.push(
        "Past yield, the permanent twist and fracture come from the energy balance (all of a side's energy into its shaft); the dynamic model is elastic here (analysis.dynamic_plasticity: false), so where slip or the drive matter these figures are approximate.",
      );
    }
  }
  const inertias = balances.map((b) => b.inertia);
  const relation = (x1: number, x2: number) =>
    pastYieldInTime ? dynamicTwistRelation(c, model, inertias, dynamic.elementTarget, x1, x2, dynamic.pieces) : balanceTwistRelation(model.sides, balances, x1, x2);
  const observedFindings = {
    twist: opts.readBack === false ? [] : readTwistBack(c, relation),
    fracture: readFracture(c, pastYieldInTime ? dynamicFracturePrediction(dynamic, plastic, verdict) : balanceFracturePrediction(plastic)),
  };

  const fits = hubFits(c, basis.basis, sides, dynamic);
  const keys = keyChecks(c, basis.basis, sides, dynamic);
  const couplings = couplingChecks(c, basis.basis, sides, dynamic);
  const gearboxes = gearboxChecks(c, basis.basis, sides, dynamic);
  const backstops = backstopChecks(c, dynamic);
  for (const b of backstops) {
    if (!b.inDynamicModel)
      warnings.push(
        `The backstop at "${b.station}" is not in the dynamic model (${c.stop.at === b.station ? 'it stands at the stop, which the jam holds already' : 'the model has no node there: it lies beyond the loaded stations, or the shaft inertia is off and the station carries no parts'}); it took no rebound there.`,
      );
  }
  for (const f of fits) {
    if (!f.inDynamicModel)
      warnings.push(
        `The shrink fit at "${f.station}" sits between other loaded stations, so the dynamic model holds it rigid; it is checked afterwards against the peak torque of the shaft next to it${f.upperBound ? ', an upper bound of what its hub carried' : ''}.`,
      );
  }

  if (c.shaft.segments.some((s) => s.coupling?.stiffness) && plastic.verdict !== 'elastic') {
    warnings.push(
      "The energy balance past yield puts all of a side's energy into its shaft and leaves the coupling's compliance out, so with a flexible coupling its figures are an upper bound; the element that holds the coupling stays elastic in the dynamic model.",
    );
  }

  // How the other model compares is the views' comparison (like for like), not part of the reason.
  const reason = basis.reason;

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
    pastYieldBasis: pastYieldInTime ? 'dynamic model' : 'energy balance',
    observedFindings,
    verdictGoverning,
    verdictYieldRatio: verdictGoverning.piece.yieldRatio,
    verdictBasis: basis.basis,
    verdictReason: reason,
    dynamic,
    keys,
    fits,
    couplings,
    gearboxes,
    backstops,
    driveTrain: driveTrainElements(basis.basis, sides, dynamic, { keys, fits, couplings, gearboxes, backstops }),
    warnings,
    cautions: CAUTIONS,
  };
}

/** The dynamic model's fracture prediction, named by the energy balance's piece where it broke first. */
function dynamicFracturePrediction(d: DynamicResult, plastic: PlasticResult, verdict: Verdict): FracturePrediction {
  const first = firstBrokenPiece(d);
  const at = first && balancePieceOf(plastic, first);
  return { verdict, ...(at ? { predictedAt: { side: at.side.side, piece: at.piece } } : {}) };
}

/** The dynamic model's governing piece in the energy method's shape, so the views read one type. */
function dynamicGoverning(c: Case, sides: SideResult[], d: DynamicResult): Results['governing'] {
  const p = d.pieces[d.governing];
  const seg = p.piece.segment;
  const piece: PieceResult = {
    piece: p.piece,
    torque: p.elasticPeakTorque,
    shearStress: p.shearStress,
    shearYield: p.shearYield,
    twist: p.elasticPeakTorque * compliance(p.piece.end - p.piece.start, c.materials[seg.material].shearModulus!, seg.diameter, seg.bore),
    yieldRatio: p.yieldRatio,
  };
  return { side: sides.find((s) => s.side === p.side) ?? sides[0], piece };
}

function fmt(x: number): string {
  return Number(x.toPrecision(3)).toString();
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
