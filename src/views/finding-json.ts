import type { Finding } from '../finding/finding.ts';
import { findingSentence } from './finding-words.ts';
import type { Results } from '../results/results.ts';

/**
 * The `finding` object of every JSON output: the one verdict, its model and that model's numbers for
 * the governing piece, SI, keys carrying their units. `yield_ratio` is the elastic stress (kt
 * applied) over shear yield (shear strength for brittle material), not a metallurgist's Sy/Sut.
 */
export function findingToJson(f: Finding, units: Results['case']['units']): Record<string, unknown> {
  const seg = f.piece.segment;
  return {
    verdict: f.verdict,
    basis: f.basis,
    basis_reason: f.basisReason,
    past_yield_model: f.pastYieldModel,
    side: f.side,
    segment: { index: seg.index, label: seg.label ?? null, from_m: f.piece.start, to_m: f.piece.end, diameter_m: seg.diameter, bore_m: seg.bore, kt: seg.kt },
    peak_torque_Nm: f.peakTorque,
    elastic_peak_torque_Nm: f.elasticPeakTorque,
    elastic_shear_stress_Pa: f.elasticStress,
    shear_yield_Pa: f.shearYield,
    yield_ratio: f.yieldRatio,
    brittle: f.brittle,
    permanent_twist_rad: f.permanentTwist ?? null,
    break_time_s: f.breakTime ?? null,
    yield_probability: f.chance?.probability ?? null,
    yield_probability_interval: f.chance?.interval ?? null,
    probability_method: f.chance
      ? `${f.chance.method}, ${f.chance.runs} runs of the ${f.chance.model}${f.chance.controlSamples ? `, ${f.chance.controlSamples} energy-method samples as the control` : ''}`
      : null,
    measured_twist: f.measured.map((m) => ({ between: m.between, measured_rad: m.measured, predicted_rad: m.predicted, finding: m.finding, speed_for_measured_rad_s: m.speedForMeasured ?? null })),
    disposition: f.disposition,
    action: f.action,
    sentence: findingSentence(f, units),
  };
}
