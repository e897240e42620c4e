import type { Case, Segment, ShaftKey } from '../case/case.ts';
import { keysOnPiece } from '../model/hub-seat.ts';
import type { ShaftPiece, Side } from '../model/shaft-model.ts';
import { keyseatDepth, keyseatPlasticRatio } from '../physics/plastic/keyseat-section.ts';
import { brittleFractureShear, fractureShearStrain, fractureShearStrainValue, isBrittle } from '../physics/fracture.ts';
import { PlasticBalance, type BalancePiece } from '../physics/plastic/plastic-balance.ts';
import type { TorsionLaw } from '../physics/plastic/plastic-torsion.ts';
import { shearYield } from '../physics/shear-strength.ts';
import { linearHardeningModulus } from '../physics/plastic/strain-hardening.ts';

/**
 * A ductile segment's torque–twist law for the time-domain model, as the energy balance and the time-domain
 * model both use it: the net section (no K_t), the case criterion's shear yield, linear
 * hardening when `analysis.hardening` asks for it and the material allows. Undefined for a brittle
 * material, which stays elastic up to fracture.
 */
export function segmentLaw(c: Case, seg: Segment): TorsionLaw | undefined {
  const m = c.materials[seg.material];
  if (isBrittle(m) || m.yieldStrength === undefined) return undefined;
  const tauY = shearYield(m.yieldStrength, c.analysis.criterion);
  const slope = c.analysis.hardening === 'linear' ? linearHardeningModulus(m, tauY / m.yieldStrength) : undefined;
  return { outerRadius: seg.diameter / 2, innerRadius: seg.bore / 2, shearModulus: m.shearModulus!, shearYield: tauY, hardeningModulus: slope ?? 0 };
}

/**
 * The law of one piece of shaft: its segment's (`segmentLaw`), on the net section of a keyed seat
 * where a station's key sits on the piece (`keysOnPiece`): the shear yield scaled by the net
 * section's fully plastic torque over the gross one's (`keyseatPlasticRatio`, Nadai's sand heap), so
 * the fully plastic torque is the net section's, the yield onset falls by the same factor (a little
 * below τ_Y·J_net/c: on the safe side), and the elastic rigidity stays the gross section's (the
 * keyseat is short against the shaft, and the elastic stress at it is the kt check's). The deepest
 * keyseat governs where two keys share a piece.
 */
export function pieceLaw(c: Case, piece: ShaftPiece, keys: readonly ShaftKey[] = keysOnPiece(c, piece)): TorsionLaw | undefined {
  const law = segmentLaw(c, piece.segment);
  const n = keyedSeatRatio(c, piece, keys);
  return law && n < 1 ? { ...law, shearYield: law.shearYield * n } : law;
}

/** The net section's fully plastic torque over the gross one's at a piece: 1 without a key. `keys`: the piece's (`keysOnPiece`), where the caller has them already. */
export function keyedSeatRatio(c: Case, piece: ShaftPiece, keys: readonly ShaftKey[] = keysOnPiece(c, piece)): number {
  const seg = piece.segment;
  return Math.min(1, ...keys.map((k) => keyseatPlasticRatio({ diameter: seg.diameter, bore: seg.bore, width: k.width, depth: keyseatDepth(k) })));
}

/**
 * One sentence per keyed piece for the assumptions: which seat, and how much of the gross section's
 * fully plastic torque its net section keeps. Empty without keys.
 */
export function keyedSeatNotes(c: Case, pieces: readonly ShaftPiece[]): string[] {
  return pieces.flatMap((p) => {
    const n = keyedSeatRatio(c, p);
    if (n >= 1) return [];
    const stations = c.stations.filter((s) => s.key && keysOnPiece(c, p).includes(s.key)).map((s) => `"${s.name}"`);
    const seg = p.segment.label ? `"${p.segment.label}"` : `segment ${p.segment.index + 1}`;
    const share = `${Number((100 * n).toPrecision(3))} %`;
    return [`The keyed seat under ${stations.join(' and ')} (${seg}) yields on its net section: ${share} of the gross fully plastic torque and yield onset (sand heap).`];
  });
}

/** What the balance needs to know about a piece beyond its law, for the results and the report. */
export interface PieceMaterialFacts {
  /** Material key. */
  material: string;
  brittle: boolean;
  /** Outer-fibre shear strain at fracture, rad; for a brittle piece the elastic strain at its fracture stress. Undefined when unknown. */
  fractureStrain: number | undefined;
  /** How the fracture strain was found. */
  fractureStrainBasis: string;
  /** Linear hardening slope used, Pa; 0 when perfectly plastic. */
  hardeningModulus: number;
}

/** A side of the stop set up for the energy balance past yield. */
export interface SideBalance {
  balance: PlasticBalance;
  facts: PieceMaterialFacts[];
  /** Inertia felt at shaft speed, kg·m² (½·J·ω² is the side's energy). */
  inertia: number;
  /** Plain-sentence notes about the set-up (a missing fracture strain, hardening not possible). */
  warnings: string[];
}

/**
 * A piece's torque–twist law and fracture twist rate for the energy balance: ductile pieces yield
 * at the case criterion's shear yield (no K_t: net-section behaviour; a keyed seat's net section,
 * `pieceLaw`), with linear hardening when
 * the case asks for it; brittle pieces stay elastic up to their fracture stress (K_t applied).
 */
export function balancePiece(c: Case, p: ShaftPiece, keys?: readonly ShaftKey[]): BalancePiece {
  const seg = p.segment;
  const m = c.materials[seg.material];
  const g = m.shearModulus!;
  const c2 = seg.diameter / 2;
  if (isBrittle(m)) {
    const law: TorsionLaw = { outerRadius: c2, innerRadius: seg.bore / 2, shearModulus: g, shearYield: Infinity, hardeningModulus: 0 };
    return { length: p.end - p.start, law, fractureTwistRate: brittleFractureShear(m, seg.kt) / (g * c2) };
  }
  const fs = fractureShearStrainValue(m);
  return { length: p.end - p.start, law: pieceLaw(c, p, keys)!, fractureTwistRate: fs !== undefined ? fs / c2 : Infinity };
}

/** Builds the side's balance from its pieces' laws (`balancePiece`), with what the results say about each piece's material. */
export function sideBalance(side: Side, c: Case, sideInertia: number): SideBalance {
  const warnings: string[] = [];
  const inputs = side.pieces.map((p) => balancePiece(c, p));
  const facts = side.pieces.map((p, i): PieceMaterialFacts => {
    const seg = p.segment;
    const m = c.materials[seg.material];
    if (isBrittle(m)) {
      return {
        material: m.key,
        brittle: true,
        fractureStrain: brittleFractureShear(m, seg.kt) / m.shearModulus!,
        fractureStrainBasis: `brittle (elongation below 5 %): breaks when K_t·τ reaches the tensile strength, at an elastic outer-fibre strain of S_ut/(K_t·G)`,
        hardeningModulus: 0,
      };
    }
    const h = inputs[i].law.hardeningModulus;
    if (c.analysis.hardening === 'linear' && h === 0) {
      warnings.push(`Material ${m.key} has no tensile strength above its yield or no elongation, so segment ${seg.index + 1} is taken as perfectly plastic.`);
    }
    const fs = fractureShearStrain(m);
    if (!fs) warnings.push(`Material ${m.key} has no reduction of area, elongation or fracture_strain, so no fracture check is made for segment ${seg.index + 1}.`);
    return { material: m.key, brittle: false, fractureStrain: fs?.value, fractureStrainBasis: fs?.basis ?? 'unknown', hardeningModulus: h };
  });
  return { balance: new PlasticBalance(inputs), facts, inertia: sideInertia, warnings: [...new Set(warnings)] };
}
