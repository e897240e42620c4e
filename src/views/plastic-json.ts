import type { PlasticPieceResult, PlasticResult, PlasticSideResult } from '../results/plastic-result.ts';
import type { ObservedFindings } from '../results/results.ts';
import type { TwistFinding } from '../results/twist-findings.ts';

/** A finite number, or null for "none" (Infinity) and "unknown" (undefined), as JSON has no Infinity. */
const num = (v: number | undefined): number | null => (v === undefined || !Number.isFinite(v) ? null : v);

/** `plastic` of the JSON result: the energy balance past yield, SI. */
export function plasticToJson(p: PlasticResult): Record<string, unknown> {
  return {
    peak_torque_Nm: p.peakTorque,
    verdict: p.verdict,
    assumptions: p.assumptions,
    brittle_notes: p.brittleNotes,
    most_strained: mostStrainedJson(p),
    sides: p.sides.map(sideJson),
  };
}

function sideJson(s: PlasticSideResult): Record<string, unknown> {
  return {
    side: s.side,
    energy_J: s.energy,
    peak_torque_Nm: s.peakTorque,
    total_twist_rad: s.totalTwist,
    permanent_twist_rad: s.permanentTwist,
    max_shear_strain: s.maxShearStrain,
    fracture_energy_J: num(s.fractureEnergy),
    verdict: s.verdict,
    segments: s.pieces.map(pieceJson),
  };
}

function pieceJson(p: PlasticPieceResult): Record<string, unknown> {
  return {
    from_m: p.piece.start,
    to_m: p.piece.end,
    segment: p.piece.segment.index,
    material: p.material,
    brittle: p.brittle,
    yield_torque_Nm: num(p.yieldTorque),
    plastic_torque_Nm: num(p.plasticTorque),
    twist_rad: p.state.twist,
    permanent_twist_rad: p.state.permanentTwist,
    permanent_surface_offset_m: p.surfaceOffset,
    permanent_helix_angle_rad: p.helixAngle,
    max_shear_strain: p.state.maxShearStrain,
    fracture_strain: num(p.fractureStrain),
    fracture_strain_basis: p.fractureStrainBasis,
    energy_J: p.state.energy,
    fracture_energy_J: num(p.fractureEnergy),
    yielded: p.yielded,
    fractured: p.state.fractured,
  };
}

/** `observed` of the JSON result: each measured permanent twist read back, SI. */
export function observedToJson(o: ObservedFindings): Record<string, unknown>[] {
  return o.twist.map((f: TwistFinding) => ({
    between: f.measurement.between,
    measured_rad: f.measurement.angle,
    measured_tolerance_rad: f.angleTolerance,
    predicted_rad: f.predicted,
    yield_onset_speed_rad_s: num(f.yieldOnsetSpeed),
    speed_for_measured_rad_s: num(f.speedForMeasured),
    speed_range_for_measured_rad_s: f.speedRange.map((v) => num(v)),
    energy_for_measured_J: num(f.energyForMeasured),
    recorded_speed_rad_s: f.recordedSpeed,
    speed_band_rad_s: [f.band.low, f.band.high],
    speed_band_basis: f.band.basis,
    beyond_fracture: f.beyondFracture,
    finding: f.finding,
    model: f.model,
    finding_text: f.meaning,
  }));
}

/** `observed_fracture` of the JSON result: the recorded fracture compared with the verdict, or null. */
export function observedFractureToJson(o: ObservedFindings): Record<string, unknown> | null {
  const f = o.fracture;
  if (!f) return null;
  return {
    type: f.observation.type,
    at: f.observation.at ?? null,
    notes: f.observation.notes ?? null,
    meaning: f.meaning,
    agreement: f.agreement,
    comparison: f.comparison,
    predicted_at: f.predictedAt ? { side: f.predictedAt.side, from_m: f.predictedAt.piece.piece.start, to_m: f.predictedAt.piece.piece.end } : null,
    source: f.source,
    caution: f.caution,
  };
}

function mostStrainedJson(p: PlasticResult): Record<string, unknown> {
  const piece = p.sides.find((s) => s.side === p.mostStrained.side)!.pieces[p.mostStrained.index];
  return { side: p.mostStrained.side, from_m: piece.piece.start, to_m: piece.piece.end };
}
