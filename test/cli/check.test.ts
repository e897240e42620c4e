import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runMain } from '../../src/cli/main.ts';
import { copyToTemp } from '../io/io-fixtures.ts';

const fixture = fileURLToPath(new URL('../data/one-disc.yaml', import.meta.url));
const bin = fileURLToPath(new URL('../../dist/cli/bin.js', import.meta.url));

async function cli(...argv: string[]) {
  let out = '';
  let err = '';
  const status = await runMain(argv, { out: (t) => (out += t), err: (t) => (err += t) });
  return { status, out, err };
}

describe('shaftcase check', () => {
  it('prints the summary with the verdict and the cautions', async () => {
    const r = await cli('check', fixture);
    expect(r.status).toBe(0);
    expect(r.out).toMatch(/^Finding: (ELASTIC|YIELDED[A-Z ]*) \(energy method\)/m);
    expect(r.out).toMatch(/lock out and tag out/);
  });

  it('--json prints the contract keys in SI', async () => {
    const j = JSON.parse((await cli('check', fixture, '--json')).out);
    expect(j.schema_version).toBe(2);
    for (const key of ['case_id', 'speed_rad_s', 'kinetic_energy_J', 'max_shear_stress_Pa', 'shear_yield_Pa', 'yield_ratio', 'verdict', 'warnings', 'sides']) {
      expect(j).toHaveProperty(key);
    }
    expect(j.speed_rad_s).toBeCloseTo((150 * 2 * Math.PI) / 60, 12);
    for (const key of ['side', 'stations', 'kinetic_energy_J', 'compliance_rad_per_Nm', 'peak_torque_Nm', 'twist_rad', 'max_shear_stress_Pa', 'segments']) {
      expect(j.sides[0]).toHaveProperty(key);
    }
    for (const key of ['from_m', 'to_m', 'torque_Nm', 'shear_stress_Pa', 'twist_rad', 'yield_ratio']) expect(j.sides[0].segments[0]).toHaveProperty(key);
    expect(j.verdict_basis).toBe('energy method');
    expect(j.verdict_reason).toMatch(/energy method/);
    for (const key of ['natural_frequencies_Hz', 'peak_torque_Nm', 'max_shear_stress_Pa', 'yield_ratio', 'duration_s', 'time_step_s', 'elements', 'segments', 'slip']) {
      expect(j.dynamic).toHaveProperty(key);
    }
    for (const key of ['from_m', 'to_m', 'peak_torque_Nm', 'shear_stress_Pa', 'yield_ratio']) expect(j.dynamic.segments[0]).toHaveProperty(key);
  });

  it('--json on a case with a belt lists its slip, and the verdict keys follow the dynamic model', async () => {
    const sample = fileURLToPath(new URL('../../sample-cases/granulator-tramp-metal.yaml', import.meta.url));
    const j = JSON.parse((await cli('check', sample, '--json')).out);
    expect(j.verdict_basis).toBe('dynamic model');
    expect(j.verdict_yield_ratio).toBe(j.dynamic.yield_ratio);
    expect(j.max_shear_stress_Pa).toBe(Math.max(...j.sides.flatMap((s: any) => s.segments.map((g: any) => g.shear_stress_Pa))));
    expect(j.dynamic.slip[0]).toEqual({ element: 'the belt at "drive sheave"', energy_J: expect.any(Number), angle_rad: expect.any(Number) });
    const f = j.dynamic.natural_frequencies_Hz;
    expect([...f].sort((a: number, b: number) => a - b)).toEqual(f);
    expect(j.dynamic.peak_torque_Nm).toBe(Math.max(...j.dynamic.segments.map((s: { peak_torque_Nm: number }) => s.peak_torque_Nm)));
  });

  it('the summary shows the dynamic model beside the energy method and says which the verdict used', async () => {
    const sample = fileURLToPath(new URL('../../sample-cases/roll-line-limiter-two-sides.yaml', import.meta.url));
    const r = await cli('check', sample);
    expect(r.out).toMatch(/Dynamic model \(the finding's model: torsional chain, \d+ shaft elements, [\d.]+ ms from the stop\)/);
    expect(r.out).toMatch(/side A {2}peak torque .* \(elastic\), stress \/ shear yield [\d.]+/);
    expect(r.out).toMatch(/For comparison, the energy method/);
    expect(r.out).toMatch(/the torque limiter in "limiter hub seat" \(slip torque 9000 N·m\) slipped/);
    expect(r.out).toMatch(/^Finding: (ELASTIC|YIELDED[A-Z ]*) \(dynamic model\)/m);
    expect(r.out).toMatch(/The verdict uses the dynamic model because the stop took 6\.00 ms/);
  });

  it('a bad case file exits 2 with file:line:column and no stack trace', () => {
    const p = spawnSync(process.execPath, [bin, 'check', fileURLToPath(new URL('../data/bad-units.yaml', import.meta.url))], { encoding: 'utf8' });
    expect(p.status).toBe(2);
    expect(p.stdout).toBe('');
    expect(p.stderr).toMatch(/bad-units\.yaml:12:17 shaft\.segments\[0\]\.diameter: "50" has no unit/);
    expect(p.stderr).not.toMatch(/\n\s+at /);
  });

  it("under --json a bad case file prints one JSON object on stderr with each mistake's code, place and field, and exits 2", () => {
    const p = spawnSync(process.execPath, [bin, 'check', '--json', fileURLToPath(new URL('../data/bad-units.yaml', import.meta.url))], { encoding: 'utf8' });
    expect(p.status).toBe(2);
    expect(p.stdout).toBe('');
    const j = JSON.parse(p.stderr);
    expect(j.schema_version).toBe(2);
    expect(j.errors.length).toBeGreaterThanOrEqual(1);
    expect(j.error).toEqual(j.errors[0]);
    expect(j.errors).toContainEqual(expect.objectContaining({ code: 'E_UNIT', line: 12, column: 17, field: 'shaft.segments[0].diameter', message: expect.stringMatching(/"50" has no unit/) }));
  });

  it('a missing case file exits 2 with a plain message', async () => {
    const r = await cli('check', 'no/such/case.yaml');
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/no\/such\/case\.yaml: cannot read the case file \(no such file\)/);
  });

  it('materials lists at least twelve materials with their sources', async () => {
    const r = await cli('materials', '--json');
    const { schema_version, materials: list } = JSON.parse(r.out);
    expect(schema_version).toBe(2);
    expect(list.length).toBeGreaterThanOrEqual(12);
    for (const m of list) expect(m.source).toMatch(/\w/);
    // In the results' style: snake_case, SI in the key names.
    const steel = list.find((m: { key: string }) => m.key === 'aisi-1045-cd');
    expect(steel.yield_strength_Pa).toBeGreaterThan(1e8);
    expect(steel.shear_modulus_Pa).toBeGreaterThan(7e10);
    expect(Object.keys(steel).every((k) => /^[a-z0-9_]+(_Pa|_kg_m3)?$/.test(k))).toBe(true);
  });

  describe('plausibility warnings', () => {
    const implausible = fileURLToPath(new URL('../data/implausible-us.yaml', import.meta.url));
    const line = /implausible-us\.yaml:13:34 shaft\.segments\[1\]\.diameter: "43 in" is larger than the shaft's whole length \(40 in\); did you mean "43 mm"\?/;

    it('check prints each warning on stderr, one line with file:line:column, before the results, and lists it among the warnings', async () => {
      const r = await cli('check', implausible);
      expect(r.status).toBe(0);
      expect(r.err).toMatch(new RegExp(`^[^\\n]*${line.source}\n`));
      expect(r.err).not.toMatch(/\n\s+at /);
      expect(r.out).toMatch(line);
    });

    it('check --json carries them in warnings and in input_warnings with code, path, line and column', async () => {
      const j = JSON.parse((await cli('check', implausible, '--json')).out);
      expect(j.input_warnings).toEqual([{ code: 'W_DIAMETER', path: 'shaft.segments[1].diameter', line: 13, column: 34, message: expect.stringMatching(/^"43 in" is larger/), fix: '43 mm' }]);
      expect(j.warnings[0]).toMatch(line);
    });

    it('a plausible case prints no warning on stderr and an empty input_warnings', async () => {
      const r = await cli('check', fixture, '--json');
      expect(r.err).toBe('');
      expect(JSON.parse(r.out).input_warnings).toEqual([]);
    });

    it.each([['check'], ['resize'], ['report']])('%s --strict turns them into errors: exit 2, the positioned message, nothing written', async (command) => {
      const copy = copyToTemp(implausible);
      const r = await cli(command, copy, '--strict');
      expect(r.status).toBe(2);
      expect(r.out).toBe('');
      expect(r.err).toMatch(line);
      expect(r.err).toMatch(/1 problem in .*implausible-us\.yaml; nothing was written\./);
      expect(existsSync(join(dirname(copy), 'reports'))).toBe(false);
    });

    it('resize prints them on stderr and lists them among its warnings', async () => {
      const r = await cli('resize', implausible);
      expect(r.status).toBe(0);
      expect(r.err).toMatch(line);
      expect(r.out).toMatch(line);
    });
  });
});
