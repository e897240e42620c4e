import { describe, expect, it } from 'vitest';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { ep5Case } from '../data/ep5-case.ts';
import { withFinding } from '../../src/finding/investigation.ts';

const observed = ['permanent_twist:', '  - { between: [seized bearing, disc], angle: 2.5 deg, method: scribe line }', 'fracture: { type: none }'];

describe('resultsToJson: plastic and observed', () => {
  it('keeps every key the JSON had before, and adds plastic, observed, observed_fracture and elastic_verdict', () => {
    const j = resultsToJson(withFinding(analyseCase(ep5Case({ observed }))));
    const before = ['case_id', 'speed_rad_s', 'kinetic_energy_J', 'max_shear_stress_Pa', 'shear_yield_Pa', 'yield_ratio', 'verdict', 'governing', 'warnings', 'cautions', 'sides'];
    expect(Object.keys(j)).toEqual(expect.arrayContaining([...before, 'elastic_verdict', 'plastic', 'observed', 'observed_fracture']));
    expect(Object.keys(j)[0]).toBe('schema_version');
    expect(Object.keys(j).slice(1, 8)).toEqual(before.slice(0, 7));
  });

  it('plastic carries peak_torque_Nm, verdict and per side and segment the named keys, in SI', () => {
    const r = withFinding(analyseCase(ep5Case({ observed })));
    const p = resultsToJson(r).plastic as Record<string, any>;
    expect(p.peak_torque_Nm).toBe(r.plastic.peakTorque);
    expect(p.verdict).toBe('yielded');
    const side = p.sides[0];
    for (const k of ['side', 'peak_torque_Nm', 'total_twist_rad', 'permanent_twist_rad', 'max_shear_strain', 'segments']) expect(side).toHaveProperty(k);
    expect(side.permanent_twist_rad).toBe(r.plastic.sides[0].permanentTwist);
    const seg = side.segments[0];
    for (const k of ['from_m', 'to_m', 'permanent_twist_rad', 'max_shear_strain', 'fracture_strain']) expect(seg).toHaveProperty(k);
    expect(seg.from_m).toBe(0);
    expect(seg.to_m).toBeCloseTo(0.5, 12);
    expect(seg.fracture_strain).toBeCloseTo(Math.sqrt(3) * Math.log(1 / 0.65), 12);
  });

  it('observed lists each measurement with between, measured_rad, predicted_rad, speed_for_measured_rad_s, energy_for_measured_J and finding', () => {
    const r = withFinding(analyseCase(ep5Case({ observed })));
    const o = resultsToJson(r).observed as Record<string, any>[];
    expect(o).toHaveLength(1);
    expect(o[0].between).toEqual(['seized bearing', 'disc']);
    expect(o[0].measured_rad).toBeCloseTo((2.5 * Math.PI) / 180, 12);
    expect(o[0].predicted_rad).toBe(r.observedFindings.twist[0].predicted);
    expect(o[0].speed_for_measured_rad_s).toBe(r.observedFindings.twist[0].speedForMeasured);
    expect(o[0].energy_for_measured_J).toBe(r.observedFindings.twist[0].energyForMeasured);
    expect(['consistent', 'more', 'less', 'no_loaded_shaft', 'unexplained']).toContain(o[0].finding);
    expect((resultsToJson(r).observed_fracture as Record<string, unknown>).agreement).toBe('agrees');
  });

  it('writes "none" and "unknown" (no fracture limit, no speed) as null, never Infinity, so the output is valid JSON', () => {
    const r = withFinding(
      analyseCase(
        ep5Case({
          material: ['shear_modulus: 79.3 GPa', 'yield_strength: 530 MPa'],
          segments: ['- { length: 250 mm, diameter: 40 mm }', '- { length: 250 mm, diameter: 60 mm }'],
          stations: ['- { name: middle, at: 250 mm }'],
          observed: ['permanent_twist:', '  - { between: [middle, disc], angle: 1 deg }'],
        }),
      ),
    );
    const j = resultsToJson(r) as Record<string, any>;
    expect(j.observed[0].speed_for_measured_rad_s).toBeNull();
    expect(j.observed[0].yield_onset_speed_rad_s).toBeNull();
    // No reduction of area, elongation or fracture_strain: no fracture limit is known.
    expect(j.plastic.sides[0].fracture_energy_J).toBeNull();
    expect(j.plastic.sides[0].segments[0].fracture_strain).toBeNull();
    expect(j.warnings.join(' ')).toMatch(/no fracture check/);
    expect(JSON.parse(JSON.stringify(j))).toEqual(j);
    expect(j.observed_fracture).toBeNull();
  });
});
