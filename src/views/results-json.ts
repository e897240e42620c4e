import type { PieceResult, SideResult } from '../physics/energy-method.ts';
import type { DynamicResult } from '../results/dynamic-result.ts';
import type { Investigation } from '../finding/investigation.ts';
import { assetHistoryToJson, fatigueToJson } from './fatigue-json.ts';
import { findingToJson } from './finding-json.ts';
import { driveTrainJson } from './drive-train-table.ts';
import { backstopCheckJson, couplingCheckJson, fitCheckJson, gearboxCheckJson, keyCheckJson } from './hub-json.ts';
import { SCHEMA_VERSION } from './schema-version.ts';
import { observedFractureToJson, observedToJson, plasticToJson } from './plastic-json.ts';
import type { Uncertainty } from '../uncertainty/uncertainty.ts';

/**
 * The machine-readable result, SI, keys carrying their units. These names are a contract: keep them
 * stable. `finding` is the one verdict every view shows (src/finding/): its model, its numbers for
 * the governing piece, its chance and what to do; read it first. The other keys are kept for their
 * readers: `max_shear_stress_Pa`, `shear_yield_Pa`, `yield_ratio`, `governing` and `sides` are the
 * elastic energy method's (a comparison where `finding.basis` is the dynamic model), `plastic` the
 * energy balance past yield (a comparison where `finding.past_yield_model` is the dynamic model),
 * `dynamic` always the dynamic model. Older note: `max_shear_stress_Pa`, `shear_yield_Pa`, `yield_ratio`, `verdict` and `governing` are by
 * the verdict's basis, which `verdict_basis` names ("energy method" or "dynamic model") and
 * `verdict_reason` explains; `sides` is always the energy method, `dynamic` always the dynamic model.
 */
export function resultsToJson(r: Investigation): Record<string, unknown> {
  return {
    schema_version: SCHEMA_VERSION,
    case_id: r.case.meta.id,
    speed_rad_s: r.speed,
    kinetic_energy_J: r.kineticEnergy,
    max_shear_stress_Pa: r.maxShearStress,
    shear_yield_Pa: r.governing.piece.shearYield,
    yield_ratio: r.yieldRatio,
    verdict: r.verdict,
    verdict_basis: r.verdictBasis,
    verdict_yield_ratio: r.verdictYieldRatio,
    verdict_reason: r.verdictReason,
    past_yield_basis: r.pastYieldBasis,
    governing: { side: r.governing.side.side, from_m: r.governing.piece.piece.start, to_m: r.governing.piece.piece.end },
    warnings: r.warnings,
    input_warnings: (r.inputWarnings ?? []).map((w) => ({ code: w.code, path: w.path, line: w.line, column: w.column, message: w.message, ...(w.fix !== undefined ? { fix: w.fix } : {}) })),
    cautions: r.cautions,
    sides: r.sides.map(sideJson),
    elastic_verdict: r.elasticVerdict,
    plastic: plasticToJson(r.plastic),
    observed: observedToJson(r.observedFindings),
    observed_fracture: observedFractureToJson(r.observedFindings),
    ...(r.uncertainty ? { uncertainty: uncertaintyJson(r.uncertainty) } : {}),
    dynamic: dynamicJson(r.dynamic),
    keys: r.keys.map(keyCheckJson),
    fits: r.fits.map(fitCheckJson),
    couplings: r.couplings.map(couplingCheckJson),
    gearboxes: r.gearboxes.map(gearboxCheckJson),
    backstops: r.backstops.map(backstopCheckJson),
    drive_train: driveTrainJson(r.finding),
    finding: findingToJson(r.finding, r.case.units),
    asset: r.case.meta.asset ?? null,
    materials_catalogue: r.case.materialCatalogue ? { file: r.case.materialCatalogue.file, sha256: r.case.materialCatalogue.sha256 } : null,
    fatigue: fatigueToJson(r.finding.fatigue),
    ...(r.assetHistory ? { asset_history: assetHistoryToJson(r.assetHistory) } : {}),
  };
}

/** The dynamic model: maxima over all segments and the whole window, per segment, and what slipped. */
function dynamicJson(d: DynamicResult): Record<string, unknown> {
  return {
    natural_frequencies_Hz: d.naturalFrequencies,
    modes: d.frequencies.map((m) => ({ side: m.side, frequency_Hz: m.frequency, refined_frequency_Hz: m.refinedFrequency, converged: m.converged, participation: m.participation })),
    peak_torque_Nm: d.peakTorque,
    max_shear_stress_Pa: d.maxShearStress,
    yield_ratio: d.yieldRatio,
    duration_s: d.duration,
    time_step_s: d.timeStep,
    elements: d.elements,
    segments: d.pieces.map((p) => ({
      from_m: p.piece.start,
      to_m: p.piece.end,
      peak_torque_Nm: p.peakTorque,
      elastic_peak_torque_Nm: p.elasticPeakTorque,
      shear_stress_Pa: p.shearStress,
      yield_ratio: p.yieldRatio,
      permanent_twist_rad: p.permanentTwist,
      max_shear_strain: p.maxShearStrain,
      broken: p.broken,
      break_time_s: p.breakTime ?? null,
    })),
    slip: d.slips.map((s) => ({ element: s.element, energy_J: s.energy, angle_rad: s.angle })),
    events: d.events.map((e) => ({ time_s: e.time, event: e.text })),
    backlash: d.gaps.map((g) => ({ segment: g.segment.index, label: g.segment.label ?? null, gap_rad: g.gap, contacts: g.contacts })),
    holds: d.holds.map((h) => ({ station: h.station, kind: h.kind, peak_torque_Nm: h.peakTorque, first_held_s: h.firstHeld ?? null })),
    protection: d.protection.map((p) => ({ station: p.station, torque_limit_Nm: p.torqueLimit ?? null, trip_after_s: p.tripAfter ?? null, tripped_at_s: p.trippedAt ?? null })),
    damping: {
      dissipated_J: d.damping.total,
      dampers: d.damping.dampers.map((x) => ({
        kind: x.kind,
        segment: x.segment?.index ?? null,
        label: x.segment?.label ?? null,
        damping_ratio: x.dampingRatio,
        energy_J: x.energy,
        share: x.share,
      })),
      ringing: d.damping.ringing
        ? {
            from_m: d.pieces[d.damping.ringing.piece].piece.start,
            to_m: d.pieces[d.damping.ringing.piece].piece.end,
            first_cycle_Nm: d.damping.ringing.firstCycle,
            last_cycle_Nm: d.damping.ringing.lastCycle,
            ratio: d.damping.ringing.ratio,
            rings_on: d.damping.ringing.ringsOn,
          }
        : null,
    },
  };
}

function sideJson(s: SideResult): Record<string, unknown> {
  return {
    side: s.side,
    stations: s.stations,
    kinetic_energy_J: s.kineticEnergy,
    shaft_kinetic_energy_J: s.shaftKineticEnergy ?? null,
    compliance_rad_per_Nm: s.compliance,
    peak_torque_Nm: s.peakTorque,
    twist_rad: s.twist,
    max_shear_stress_Pa: Math.max(...s.pieces.map((p) => p.shearStress)),
    parts: s.parts.map((p) => ({
      station: p.station,
      name: p.part.name,
      shape: p.part.shape,
      inertia_kg_m2: p.part.inertia,
      count: p.part.count,
      speed_ratio: p.part.speedRatio,
      reflected_inertia_kg_m2: p.reflectedInertia,
      kinetic_energy_J: p.kineticEnergy,
    })),
    segments: s.pieces.map(pieceJson),
  };
}

function pieceJson(p: PieceResult): Record<string, unknown> {
  const seg = p.piece.segment;
  return {
    from_m: p.piece.start,
    to_m: p.piece.end,
    segment: seg.index,
    label: seg.label ?? null,
    diameter_m: seg.diameter,
    bore_m: seg.bore,
    material: seg.material,
    kt: seg.kt,
    torque_Nm: p.torque,
    shear_stress_Pa: p.shearStress,
    shear_yield_Pa: p.shearYield,
    twist_rad: p.twist,
    yield_ratio: p.yieldRatio,
  };
}

/** The 5th, 50th and 95th percentiles by name, so that a reader need not know the places of an array. */
function named([p5, p50, p95]: readonly number[]): { p5: number; p50: number; p95: number } {
  return { p5, p50, p95 };
}

/** One end of a sensitivity swing: the input's value there (SI, the input's own kind) and what it gives. */
function swingEnd(value: number, yieldRatio: number, permanentTwist: number | undefined): Record<string, number> {
  return { value, yield_ratio: yieldRatio, ...(permanentTwist !== undefined ? { permanent_twist_rad: permanentTwist } : {}) };
}

function uncertaintyJson(u: Uncertainty): Record<string, unknown> {
  return {
    samples: u.samples,
    seed: u.seed,
    strength_scatter: u.strengthScatter,
    inputs: u.inputs.map((i) => ({ input: i.path, mean: i.mean, sd: i.sd })),
    not_varied: u.notVaried,
    yield_probability: u.yieldProbability,
    percentiles: {
      yield_ratio: named(u.percentiles.yieldRatio),
      max_shear_stress_Pa: named(u.percentiles.maxShearStress),
      peak_torque_Nm: named(u.percentiles.peakTorque),
      permanent_twist_rad: u.percentiles.permanentTwist ? named(u.percentiles.permanentTwist) : null,
    },
    sensitivity: u.sensitivity.map((s) => ({
      input: s.input,
      low: swingEnd(s.inputLow, s.low, s.twistLow),
      high: swingEnd(s.inputHigh, s.high, s.twistHigh),
    })),
    observed: u.observed.map((o) => ({ between: o.between, speed_interval_rad_s: o.speedInterval, recorded_inside: o.recordedInside, unexplained_share: o.unexplainedShare })),
    ...(u.dynamic
      ? {
          dynamic: {
            samples: u.dynamic.samples,
            yield_probability: u.dynamic.yieldProbability,
            percentiles: {
              yield_ratio: named(u.dynamic.percentiles.yieldRatio),
              peak_torque_Nm: named(u.dynamic.percentiles.peakTorque),
              max_shear_stress_Pa: named(u.dynamic.percentiles.maxShearStress),
            },
          },
        }
      : {}),
  };
}
