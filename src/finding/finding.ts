/**
 * The finding of an incident: one verdict, the model it stands on, the piece that governs, that
 * model's numbers for that piece, the chance of the verdict under the case's tolerances from the
 * same model, and what to do next. Decided here once from the results; `check`, `resize`, the report
 * and every JSON output render it and decide nothing of their own.
 */
import type { SideName, ShaftPiece } from '../model/shaft-model.ts';
import { isBrittle } from '../physics/fracture.ts';
import { firstBrokenPiece, pieceTorqueHistory, type DynamicPiece } from '../results/dynamic-result.ts';
import type { Results } from '../results/results.ts';
import type { DriveTrainElement } from '../results/drive-train.ts';
import type { TwistFindingCode } from '../results/twist-findings.ts';
import { findingChance, type FindingChance } from './finding-chance.ts';
import { incidentFatigue, type IncidentFatigue } from './incident-fatigue.ts';

/**
 * The states of a shaft after the incident, in the trade's words. `yielded locally`: the net section
 * stays elastic but the stress at a stress raiser (kt) passes shear yield; `yielded`: the net section
 * yields through and keeps a permanent twist; `fracture predicted`: a piece reaches its fracture
 * strain (ductile) or strength (brittle).
 */
export type FindingVerdict = 'elastic' | 'yielded locally' | 'yielded' | 'fracture predicted';

/**
 * What happens to the shaft, in the plant's words: it may go back after the checks, it is inspected
 * (crack test at the stress raiser) before anyone decides, or it is replaced.
 */
export type FindingAction = 'return to service' | 'inspect before return' | 'replace';

/** The model a finding stands on. The energy method's result past yield is the energy balance. */
export type FindingBasis = 'energy method' | 'dynamic model';

/** One measured twist read back by the finding's model. */
export interface MeasuredTwistFinding {
  between: [string, string];
  measured: number;
  predicted: number;
  finding: TwistFindingCode;
  /** Speed at the stop that leaves the measured twist, rad/s. */
  speedForMeasured: number | undefined;
}

export interface Finding {
  verdict: FindingVerdict;
  basis: FindingBasis;
  /** Why that model, one sentence. */
  basisReason: string;
  /** Which model the permanent twist, the break and the read-back come from. */
  pastYieldModel: 'energy balance' | 'dynamic model';
  side: SideName;
  /** The governing piece: the first to break where one breaks, else the one with the highest stress over shear yield. */
  piece: ShaftPiece;
  /**
   * Peak torque the governing piece carried, N·m: capped by plasticity where it yields (what keys,
   * hubs and couplings really saw), else the elastic peak.
   */
  peakTorque: number;
  /** The peak torque the governing piece would have carried had the shaft stayed elastic, N·m (the stress below stands on it). */
  elasticPeakTorque: number;
  /** The elastic (kt) stress at the governing piece and its shear yield (or shear strength for brittle material), Pa. */
  elasticStress: number;
  shearYield: number;
  /** elasticStress / shearYield: how far past yield the incident went had the shaft stayed elastic. */
  yieldRatio: number;
  /** Whether the governing piece's material is brittle (its limit is a strength, not a yield). */
  brittle: boolean;
  /** Permanent twist left on the governing side, rad; undefined where none is predicted or the side broke. */
  permanentTwist: number | undefined;
  /** When the governing piece broke, s from the stop's start; undefined where none breaks or the model keeps no time. */
  breakTime: number | undefined;
  /** The chance of yield under the case's tolerances, from the finding's own model; undefined without tolerances. */
  chance: FindingChance | undefined;
  measured: MeasuredTwistFinding[];
  /** What to do next, one line. */
  disposition: string;
  /**
   * Every element of the drive train in the order it would have given way: highest torque over
   * capacity first (`order` 1), so the first is the weakest, shaft or not.
   */
  driveTrain: OrderedElement[];
  /** The weakest element of the drive train (`driveTrain[0]`). */
  weakest: OrderedElement | undefined;
  /** The incident's fatigue at the governing piece's stress raiser: its cycles and damage. */
  fatigue: IncidentFatigue;
  /** The disposition in three words: the decision the person who signs makes. */
  action: FindingAction;
}

/** A drive-train element with its place in the order of giving way (1: first). */
export interface OrderedElement extends DriveTrainElement {
  order: number;
}

/** Decides the finding from the results. Pure. */
export function decideFinding(r: Results): Finding {
  const basis: FindingBasis = r.verdictBasis;
  const pastYieldModel = r.pastYieldBasis;
  const verdict = findingVerdict(r);
  const broke = pastYieldModel === 'dynamic model' ? firstBrokenPiece(r.dynamic) : undefined;
  const g = governingPiece(r, broke);
  const material = r.case.materials[g.piece.segment.material];
  const brittle = isBrittle(material);
  const driveTrain = orderDriveTrain(r);
  return {
    verdict,
    basis,
    basisReason: r.verdictReason,
    pastYieldModel,
    side: g.side,
    piece: g.piece,
    peakTorque: peakTorqueCarried(r, g, verdict),
    elasticPeakTorque: g.elasticTorque,
    elasticStress: g.shearStress,
    shearYield: g.shearYield,
    yieldRatio: g.yieldRatio,
    brittle,
    permanentTwist: verdict === 'yielded' ? permanentTwistOf(r, g.side) : undefined,
    breakTime: verdict === 'fracture predicted' ? broke?.breakTime : undefined,
    chance: findingChance(r),
    measured: r.observedFindings.twist.map((f) => ({
      between: f.measurement.between,
      measured: f.measurement.angle,
      predicted: f.predicted,
      finding: f.finding,
      speedForMeasured: f.speedForMeasured,
    })),
    disposition: disposition(verdict, brittle),
    driveTrain,
    weakest: driveTrain[0],
    fatigue: incidentFatigue(material, g.piece.segment.kt, g.shearStress, g.elasticTorque, pieceTorqueHistory(r.dynamic, g.piece)?.values),
    action: actionOf(verdict, brittle),
  };
}

/**
 * The drive train in the order of giving way: by torque over capacity, highest first; at equal
 * ratios the lower capacity first (it goes at the lower torque). A device that slipped or parted
 * stands at a ratio of at least 1, so it comes before anything that held.
 */
function orderDriveTrain(r: Results): OrderedElement[] {
  return [...r.driveTrain].sort((a, b) => b.ratio - a.ratio || a.capacity - b.capacity).map((e, i) => ({ ...e, order: i + 1 }));
}

/** The verdict with the local and the through-section yield told apart. */
function findingVerdict(r: Results): FindingVerdict {
  if (r.verdict === 'fracture predicted') return 'fracture predicted';
  if (r.verdict === 'elastic') return 'elastic';
  const netSection = r.pastYieldBasis === 'dynamic model' ? r.dynamic.yielded : r.plastic.verdict !== 'elastic';
  return netSection ? 'yielded' : 'yielded locally';
}

interface GoverningPiece {
  side: SideName;
  piece: ShaftPiece;
  elasticTorque: number;
  shearStress: number;
  shearYield: number;
  yieldRatio: number;
  /** The dynamic model's piece where the basis is the dynamic model. */
  dynamic?: DynamicPiece;
}

/** The first piece to break where one breaks, else the piece of the basis model with the highest ratio. */
function governingPiece(r: Results, broke: DynamicPiece | undefined): GoverningPiece {
  if (broke)
    return { side: broke.side, piece: broke.piece, elasticTorque: broke.elasticPeakTorque, shearStress: broke.shearStress, shearYield: broke.shearYield, yieldRatio: broke.yieldRatio, dynamic: broke };
  if (r.verdict === 'fracture predicted' && r.pastYieldBasis === 'energy balance') {
    const side = r.plastic.sides.find((s) => s.verdict === 'fracture predicted');
    const first = side?.firstToBreak === undefined ? undefined : side.pieces[side.firstToBreak];
    const elastic = first && r.sides.find((s) => s.side === side!.side)?.pieces.find((p) => p.piece.start === first.piece.start && p.piece.end === first.piece.end);
    if (elastic) return { side: side!.side, piece: elastic.piece, elasticTorque: elastic.torque, shearStress: elastic.shearStress, shearYield: elastic.shearYield, yieldRatio: elastic.yieldRatio };
  }
  const g = r.verdictGoverning;
  const dynamic = r.verdictBasis === 'dynamic model' ? r.dynamic.pieces[r.dynamic.governing] : undefined;
  return { side: g.side.side, piece: g.piece.piece, elasticTorque: g.piece.torque, shearStress: g.piece.shearStress, shearYield: g.piece.shearYield, yieldRatio: g.piece.yieldRatio, dynamic };
}

/** The torque the governing piece really carried: the dynamic model's capped peak, or the balance's where it yields. */
function peakTorqueCarried(r: Results, g: GoverningPiece, verdict: FindingVerdict): number {
  if (g.dynamic) return g.dynamic.peakTorque;
  const balance = r.plastic.sides.find((s) => s.side === g.side);
  return (verdict === 'yielded' || verdict === 'fracture predicted') && balance ? balance.peakTorque : g.elasticTorque;
}

/** Permanent twist left on a side by the past-yield model, rad; undefined below what a dial or a scribed line resolves. */
function permanentTwistOf(r: Results, side: SideName): number | undefined {
  const twist =
    r.pastYieldBasis === 'dynamic model'
      ? r.dynamic.pieces.filter((p) => p.side === side && !p.broken).reduce((sum, p) => sum + p.permanentTwist, 0)
      : (r.plastic.sides.find((s) => s.side === side)?.permanentTwist ?? 0);
  return twist > 0 ? twist : undefined;
}

const DISPOSITION: Record<FindingVerdict, string> = {
  'fracture predicted': 'Not fit to return: the shaft is broken or cracked through; replace it and find out why nothing gave way first (see what goes back in).',
  yielded: 'Not fit to return: the shaft has taken a permanent twist; replace it (see what goes back in) and inspect every key, hub and coupling between the stop and the loaded parts.',
  'yielded locally':
    'Not returned to service on this calculation alone: inspect the stress raiser named above for cracks (magnetic particle or dye penetrant) before any decision; a repeat of the incident uses up its fatigue life.',
  elastic: "May go back after inspection: no yield is predicted; inspect keys, hubs, couplings and the shaft's runout before return to service.",
};

/** Replace where the section yielded through or broke (or brittle material passed its strength); inspect where it yielded at a stress raiser only. */
function actionOf(verdict: FindingVerdict, brittle: boolean): FindingAction {
  if (verdict === 'elastic') return 'return to service';
  if (verdict === 'yielded locally' && !brittle) return 'inspect before return';
  return 'replace';
}

function disposition(verdict: FindingVerdict, brittle: boolean): string {
  if (brittle && verdict === 'yielded locally') {
    return 'Not fit to return: a brittle material over its strength at a stress raiser cracks rather than yields; replace it (see what goes back in).';
  }
  return DISPOSITION[verdict];
}
