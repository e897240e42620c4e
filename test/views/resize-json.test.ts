import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { resizeCase } from '../../src/resize/resize-case.ts';
import { resizeToJson } from '../../src/views/resize-json.ts';
import { resultsToJson } from '../../src/views/results-json.ts';
import { withFinding } from '../../src/finding/investigation.ts';

const json = (f: string) => {
  const c = parseCase(readFileSync(new URL(`../../sample-cases/${f}`, import.meta.url), 'utf8'));
  const r = withFinding(analyseCase(c));
  return { r, j: JSON.parse(JSON.stringify(resizeToJson(resizeCase(c, r)))) };
};

describe('resize --json', () => {
  it('is the check --json object with resize added, the contract keys named as in the issue', () => {
    const { r, j } = json('granulator-tramp-metal.yaml');
    const { resize, ...check } = j;
    expect(check).toEqual(JSON.parse(JSON.stringify(resultsToJson(r))));
    expect(resize.factor).toBe(1.5);
    expect(resize.scale_side).toMatchObject({ side: 'A', s: r.yieldRatio * 1.5 });
    expect(resize.scale_side.diameters_m).toHaveLength(4);
    expect(resize.critical_segment).toMatchObject({ diameter_m: null });
    expect(resize.critical_segment.reason).toMatch(/No size of/);
    for (const m of resize.materials) expect(Object.keys(m)).toEqual(expect.arrayContaining(['key', 'yield_ratio']));
    expect(resize.limiter).toMatchObject({ min_Nm: expect.any(Number), max_Nm: expect.any(Number), slip_energy_J: expect.any(Number) });
    // The granulator's verdict stands on the dynamic model (a drive behind a belt): so do these figures.
    expect(resize.limiter).toMatchObject({ slip_method: 'dynamic model', slip_segment: 0, modelled_from_m: 0.06, modelled_to_m: 0.12 });
    expect(resize.scale_side.frequency_method).toBe('dynamic model');
    expect(resize.key).toMatchObject({ shear_stress_Pa: expect.any(Number), bearing_stress_Pa: expect.any(Number), shears_before_shaft_yields: false });
  });

  it("gives null for what the case does not say: the limiter's lower end and the key", () => {
    const { j } = json('edger-arbor-two-sides.yaml');
    expect(j.resize.limiter.min_Nm).toBeNull();
    // One loaded station a side, instantaneous stop, no drive: the energy method is exact.
    expect(j.resize.limiter).toMatchObject({ slip_method: 'energy method', slip_segment: null });
    expect(j.resize.scale_side.frequency_method).toBe('energy method');
    expect(j.resize.key).toBeNull();
    expect(j.resize.running.torque_Nm).toBeNull();
  });

  it("carries the pick in snake_case, with its rule, and every option's flags", () => {
    const { j } = json('screw-conveyor-jam-us.yaml');
    expect(j.resize.recommended).toMatchObject({ option: 'material:aisi-4340-qt540', reason: expect.stringMatching(/keeps N = 1.5/) });
    expect(j.resize.pick_rule).toMatch(/least change/);
    expect(j.resize.limiter.flags).toEqual([expect.stringMatching(/^fails its own design factor: .* 0\.668, above the 0\.667 that N = 1\.5 allows$/)]);
    expect(j.resize.scale_side.flags).toEqual([]);
    expect(j.resize.critical_segment.flags).toEqual([]);
    expect(j.resize.materials.find((m: { key: string }) => m.key === 'al-7075-t6').flags).toEqual([expect.stringMatching(/another family of material \(aluminium alloy\)/)]);
    expect(j.resize.keys[0].flags.join(' ')).toMatch(/no dependable fuse/);
  });

  it('carries the cautions, the guarding and the notes', () => {
    const { j } = json('screw-conveyor-jam-us.yaml');
    expect(j.cautions.length).toBeGreaterThanOrEqual(3);
    // A screw conveyor jammed on a lump of its own product: no wheel, no tramp metal.
    expect(j.resize.guarding.join(' ')).not.toMatch(/speed marked on it|metal detector/);
    expect(j.resize.guarding.join(' ')).toMatch(/Restart to a written procedure: the locks and tags/);
    expect(j.resize.notes.join(' ')).toMatch(/rechecked/);
  });
});
