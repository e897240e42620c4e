import type { Part, YieldCriterion } from '../case/case.ts';
import type { Material } from '../materials/material.ts';
import type { ShaftPiece, Side, SideName } from '../model/shaft-model.ts';
import { kineticEnergy, reflectedInertia } from './inertia.ts';
import { verdictShearStrength } from './shear-strength.ts';
import { compliance, shaftInertia, shearStress, torqueForEnergy } from './torsion.ts';

/** One piece of shaft under the side's peak torque. */
export interface PieceResult {
  piece: ShaftPiece;
  /** Torque carried, N·m (the side's peak torque: the pieces are in series). */
  torque: number;
  /** Outer-fibre shear stress with the segment's kt applied, Pa. */
  shearStress: number;
  /** Shear yield of the segment's material by the case's criterion, Pa; for brittle material its fracture shear S_ut (`verdictShearStrength`). */
  shearYield: number;
  /** Elastic twist of this piece, rad. */
  twist: number;
  /** shearStress / shearYield. */
  yieldRatio: number;
}

export interface PartEnergy {
  station: string;
  part: Part;
  /** Inertia felt at shaft speed, J·ratio²·count, kg·m². */
  reflectedInertia: number;
  /** Kinetic energy at the stop, J. */
  kineticEnergy: number;
}

/** The elastic energy method's result for one side of the stop. */
export interface SideResult {
  side: SideName;
  stations: string[];
  parts: PartEnergy[];
  /** Kinetic energy of the side's parts, J. */
  kineticEnergy: number;
  /** Kinetic energy of the side's loaded shaft, J (not added to the energy, as in the hand method). */
  shaftKineticEnergy: number | undefined;
  /** Σ L/(G·J_p) of the loaded shaft, rad/(N·m). */
  compliance: number;
  /** T = √(2E/C), N·m. */
  peakTorque: number;
  /** Twist of the side, T·C, rad. */
  twist: number;
  pieces: PieceResult[];
}

/** Kinetic energy of each part at shaft speed ω, through its speed ratio. */
export function partEnergies(side: Side, speed: number): PartEnergy[] {
  return side.stations.flatMap((s) =>
    s.parts.map((part) => {
      const j = reflectedInertia(part.inertia, part.speedRatio) * part.count;
      return { station: s.name, part, reflectedInertia: j, kineticEnergy: kineticEnergy(j, speed) };
    }),
  );
}

/**
 * The classic energy method for a sudden stop, generalised to stepped, hollow and multi-part
 * sides: all of the side's kinetic energy ½Jω² becomes elastic strain energy T²C/2 of the shaft
 * between the stop and the parts, so T = √(2E/C). Exact for one inertia on a massless shaft stopped
 * instantly (Gere & Goodno, Mechanics of Materials 7th ed., Sec. 3.9, Problem 3.9-11; from memory,
 * confident); approximate where several stations on a side carry parts.
 */
export function energyMethodSide(side: Side, speed: number, materials: Record<string, Material>, criterion: YieldCriterion): SideResult {
  const parts = partEnergies(side, speed);
  const energy = parts.reduce((sum, p) => sum + p.kineticEnergy, 0);
  const pieceCompliance = side.pieces.map((p) => compliance(p.end - p.start, materials[p.segment.material].shearModulus!, p.segment.diameter, p.segment.bore));
  // A coupling is a spring in series with the shaft: its compliance 1/k_c adds to the side's
  // (springs in series, shared reference 1.1.5 and 10.12; from memory, confident). A coupling's
  // segment holds no station, so it is one piece.
  const couplings = side.pieces.reduce((sum, p) => sum + (p.segment.coupling?.stiffness ? 1 / p.segment.coupling.stiffness : 0), 0);
  const totalCompliance = pieceCompliance.reduce((a, b) => a + b, 0) + couplings;
  const peakTorque = torqueForEnergy(energy, totalCompliance);

  const pieces = side.pieces.map((piece, i): PieceResult => {
    const { segment } = piece;
    const tauY = verdictShearStrength(materials[segment.material], criterion);
    const tau = segment.kt * shearStress(peakTorque, segment.diameter, segment.bore);
    return { piece, torque: peakTorque, shearStress: tau, shearYield: tauY, twist: peakTorque * pieceCompliance[i], yieldRatio: tau / tauY };
  });

  let shaftInertiaSum: number | undefined = 0;
  for (const p of side.pieces) {
    const rho = materials[p.segment.material].density;
    if (rho === undefined) {
      shaftInertiaSum = undefined;
      break;
    }
    shaftInertiaSum += shaftInertia(rho, p.end - p.start, p.segment.diameter, p.segment.bore);
  }

  return {
    side: side.side,
    stations: side.stations.map((s) => s.name),
    parts,
    kineticEnergy: energy,
    shaftKineticEnergy: shaftInertiaSum === undefined ? undefined : kineticEnergy(shaftInertiaSum, speed),
    compliance: totalCompliance,
    peakTorque,
    twist: peakTorque * totalCompliance,
    pieces,
  };
}
