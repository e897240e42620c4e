import type { YieldCriterion } from '../case/case.ts';
import type { FuseOrder } from '../resize/fuse-order.ts';
import type { KeyFuse, KeyStress } from '../resize/key-fuse.ts';
import type { Flagged, ResizeResult } from '../resize/resize-result.ts';
import type { RunningCheck } from '../resize/running-check.ts';
import { sideOf, sideYieldRatio } from '../resize/side-ratio.ts';
import { resultsToJson } from './results-json.ts';
import { combinedSentences, criticalSegmentSentence, limiterSentences, recommendedChange, materialsSentence, scaleSideSentence } from './resize-words.ts';

/** The `resize --json` object: the `check --json` object with `resize` added. SI, units in key names. */
export function resizeToJson(z: ResizeResult): Record<string, unknown> {
  return { ...resultsToJson(z.results), resize: resizeJson(z) };
}

/** The `resize` object of `resize --json` (and of a report's results.json). */
export function resizeJson(z: ResizeResult): Record<string, unknown> {
  const s = z.scaleSide;
  const k = z.criticalSegment;
  const l = z.limiter;
  return {
    factor: z.designFactor,
    service_factor: z.serviceFactor,
    max_scale: z.maxScale,
    method: 'elastic energy method; each option rerun through the engine',
    recommended: z.recommended ? { option: z.recommended.option, reason: z.recommended.reason, change: recommendedChange(z, z.recommended.option) } : null,
    pick_rule: z.pickRule,
    running: runningJson(z.present.running),
    scale_side: {
      side: s.side,
      s: s.s,
      practical: s.practical,
      segments: s.segments.map((g) => g.index),
      diameters_m: s.diameters,
      stock_diameters_m: s.stockDiameters,
      yield_ratio: sideYieldRatio(s.rerun, s.side),
      stock_yield_ratio: sideYieldRatio(s.stockRerun, s.side),
      stock_peak_torque_Nm: sideOf(s.stockRerun, s.side).peakTorque,
      stiffness_ratio: s.change.stiffness,
      frequency_ratio: s.change.frequency,
      frequency_method: s.change.frequencyMethod,
      running: runningJson(s.running),
      flags: s.flags,
      reason: scaleSideSentence(z),
    },
    critical_segment: {
      side: k.side,
      segment: k.segment.index,
      verdict: k.verdict,
      diameter_m: k.diameter ?? null,
      stock_diameter_m: k.stockDiameter ?? null,
      stock_yield_ratio: k.stockRerun ? sideYieldRatio(k.stockRerun, k.side) : null,
      running: k.running ? runningJson(k.running) : null,
      flags: k.flags,
      reason: criticalSegmentSentence(z),
    },
    materials: z.materials.map((m) => ({
      key: m.material.key,
      yield_ratio: m.yieldRatio,
      keeps_factor: m.keepsFactor,
      peak_torque_ratio: m.change.peakTorque,
      frequency_ratio: m.change.frequency,
      frequency_method: m.change.frequencyMethod,
      strength_basis: m.material.strengthBasis ?? null,
      running: runningJson(m.running),
      flags: m.flags,
    })),
    materials_summary: materialsSentence(z),
    limiter: {
      at: l.station,
      side: l.side,
      min_Nm: l.min ?? null,
      max_Nm: l.max,
      window_empty: l.windowEmpty,
      setting_Nm: l.slip.setting,
      peak_torque_Nm: l.slip.peakTorque,
      yield_ratio: l.yieldRatio,
      slip_energy_J: l.slip.slipEnergy,
      slip_angle_rad: l.slip.slipAngle,
      method: l.slip.method,
      slip_method: l.slip.slipMethod,
      slip_segment: l.slip.segment ?? null,
      modelled_from_m: l.slip.modelledFrom ?? null,
      modelled_to_m: l.slip.modelledTo ?? null,
      flags: l.flags,
      fuses: fusesJson(l.fuses),
      reason: limiterSentences(z).join(' '),
    },
    combined: z.combined.map((o) => ({
      option: o.option,
      material: o.material?.key ?? null,
      segments: o.segments.map((g) => ({ segment: g.segment.index, diameter_m: g.segment.diameter, stock_diameter_m: g.stockDiameter, growth: g.growth })),
      limiters: o.limiters.map((x) => ({
        at: x.station,
        side: x.side,
        setting_Nm: x.setting,
        setting_rule: x.settingRule,
        min_Nm: x.min ?? null,
        max_Nm: x.max,
        peak_torque_Nm: x.slip.peakTorque,
        yield_ratio: x.yieldRatio,
        slip_energy_J: x.slip.slipEnergy,
        slip_angle_rad: x.slip.slipAngle,
        slip_method: x.slip.slipMethod,
        fuses: fusesJson(x.fuses),
      })),
      yield_ratio: o.yieldRatio,
      running: runningJson(o.running),
      flags: o.flags,
      reason: combinedSentences(z, o).join(' '),
    })),
    key: z.keys.length > 0 ? keyJson(z.keys[0], z.results.case.analysis.criterion) : null,
    keys: z.keys.map((k) => keyJson(k, z.results.case.analysis.criterion)),
    rated_speed: z.ratedSpeed.map((w) => ({ station: w.station, part: w.part, speed_rad_s: w.speed, rated_speed_rad_s: w.ratedSpeed, over: w.over })),
    guarding: z.guarding.map((g) => `${g.topic}: ${g.text}`),
    notes: z.notes,
  };
}

function fusesJson(f: FuseOrder): Record<string, unknown> {
  return {
    setting_Nm: f.setting,
    order: f.steps.map((s) => ({ element: s.element, kind: s.kind, capacity_Nm: s.capacity, multiple_of_setting: s.multiple, seat_changed: s.seatChanged })),
    uprate: f.uprate.map((s) => ({ element: s.element, kind: s.kind, capacity_Nm: s.capacity, needed_Nm: s.needed })),
  };
}

function runningJson(r: RunningCheck): Record<string, unknown> {
  return {
    torque_Nm: r.running?.torque ?? null,
    source: r.running?.source ?? null,
    factor_static: r.factorStatic ?? null,
    factor_with_kt: r.factorWithKt ?? null,
    keeps_factor: r.keeps ?? null,
  };
}

function keyJson(k: KeyFuse & Flagged, criterion: YieldCriterion): Record<string, unknown> {
  const stress = (s: KeyStress) => ({ torque_Nm: s.torque, shear_stress_Pa: s.shearStress, bearing_stress_Pa: s.bearingStress, shear_ratio: s.shearRatio, bearing_ratio: s.bearingRatio });
  return {
    station: k.station,
    shaft_diameter_m: k.segment.diameter,
    ...stress(k.incident),
    shears_before_shaft_yields: k.shearsBeforeShaftYields,
    shear_ratio_basis: criterion === 'max-shear' ? 'shear yield 0.5·Sy (maximum shear)' : 'shear yield Sy/√3 (distortion energy)',
    shear_off_torque_Nm: k.shearOffTorque,
    shear_off_basis: k.shearOffBasis,
    crush_torque_Nm: k.crushTorque,
    shaft_yield_torque_Nm: k.shaftYieldTorque,
    at_limiter: k.atLimiter ? stress(k.atLimiter) : null,
    at_running: k.atRunning ? { ...stress(k.atRunning), factor: k.atRunning.factor } : null,
    flags: k.flags,
  };
}
