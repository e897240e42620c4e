import type { FitCheck } from '../results/hub-fits.ts';
import type { KeyCheck } from '../results/key-checks.ts';
import type { CouplingCheck } from '../results/coupling-checks.ts';
import type { GearboxCheck } from '../results/gearbox-checks.ts';
import type { BackstopCheck } from '../results/backstop-checks.ts';

/** A key at the incident torque, SI, each strength's basis in words beside the number it sets. */
export function keyCheckJson(k: KeyCheck): Record<string, unknown> {
  return {
    station: k.station,
    shaft_diameter_m: k.shaftDiameter,
    torque_Nm: k.torque,
    torque_is_upper_bound: k.upperBound,
    shear_stress_Pa: k.shearStress,
    bearing_stress_Pa: k.bearingStress,
    shear_yield_Pa: k.shearYield,
    shear_ratio: k.shearRatio,
    shear_ratio_basis: k.shearYieldBasis,
    bearing_ratio: k.bearingRatio,
    shear_off_torque_Nm: k.shearOffTorque,
    shear_off_basis: k.shearOffBasis,
    crush_torque_Nm: k.crushTorque,
    shaft_yield_torque_Nm: k.shaftYieldTorque,
  };
}

/** A shrink or press fit at the incident torque, SI. */
export function fitCheckJson(f: FitCheck): Record<string, unknown> {
  return {
    station: f.station,
    contact_pressure_Pa: f.contactPressure,
    slip_torque_Nm: f.slipTorque,
    slipped: f.slipped,
    torque_Nm: f.torque,
    torque_is_upper_bound: f.upperBound,
    in_dynamic_model: f.inDynamicModel,
    hub_hoop_stress_Pa: f.hubHoopStress,
    hub_yield_strength_Pa: f.hubYieldStrength ?? null,
    shaft_yield_torque_Nm: Number.isFinite(f.shaftYieldTorque) ? f.shaftYieldTorque : null,
    slips_before_shaft_yields: f.slipsBeforeShaftYields,
  };
}

/** A coupling against the incident torque, SI. */
export function couplingCheckJson(k: CouplingCheck): Record<string, unknown> {
  return {
    segment: k.segment.index,
    label: k.segment.label ?? null,
    stiffness_Nm_per_rad: k.stiffness ?? null,
    rated_torque_Nm: k.ratedTorque,
    peak_rating_Nm: k.peakRating ?? null,
    torque_Nm: k.torque,
    rated_ratio: k.ratedRatio,
    capacity_ratio: k.capacityRatio,
  };
}

/** A gearbox against its rating × service factor at the incident torque, SI. */
export function gearboxCheckJson(g: GearboxCheck): Record<string, unknown> {
  return {
    station: g.station,
    ratio: g.ratio,
    efficiency: g.efficiency,
    back_drivable: g.backDrivable,
    rated_output_torque_Nm: g.ratedOutputTorque,
    service_factor: g.serviceFactor,
    capacity_Nm: g.capacity,
    output_torque_Nm: g.outputTorque,
    torque_is_upper_bound: g.upperBound,
    input_torque_Nm: g.inputTorque,
    rating_ratio: g.ratingRatio,
    held_torque_Nm: g.heldTorque ?? null,
    tooth_load_N: g.tooth?.load ?? null,
    lewis_form_factor: g.tooth?.formFactor ?? null,
    tooth_bending_stress_Pa: g.tooth?.bendingStress ?? null,
  };
}

/** A backstop with the rebound torque it held, SI. */
export function backstopCheckJson(b: BackstopCheck): Record<string, unknown> {
  return {
    station: b.station,
    rebound_torque_Nm: b.reboundTorque,
    first_held_s: b.firstHeld ?? null,
    rated_torque_Nm: b.ratedTorque ?? null,
    ratio: b.ratio ?? null,
    in_dynamic_model: b.inDynamicModel,
  };
}
