import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runMain } from '../../src/cli/main.ts';

const fixture = fileURLToPath(new URL('../data/one-disc.yaml', import.meta.url));
const bin = fileURLToPath(new URL('../../dist/src/cli/bin.js', import.meta.url));

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
    expect(r.out).toMatch(/Verdict \(elastic energy method\): (ELASTIC|YIELDED)/);
    expect(r.out).toMatch(/lock out and tag out/);
  });

  it('--json prints the contract keys in SI', async () => {
    const j = JSON.parse((await cli('check', fixture, '--json')).out);
    for (const key of ['case_id', 'speed_rad_s', 'kinetic_energy_J', 'max_shear_stress_Pa', 'shear_yield_Pa', 'yield_ratio', 'verdict', 'warnings', 'sides']) {
      expect(j).toHaveProperty(key);
    }
    expect(j.speed_rad_s).toBeCloseTo((150 * 2 * Math.PI) / 60, 12);
    for (const key of ['side', 'stations', 'kinetic_energy_J', 'compliance_rad_per_Nm', 'peak_torque_Nm', 'twist_rad', 'max_shear_stress_Pa', 'segments']) {
      expect(j.sides[0]).toHaveProperty(key);
    }
    for (const key of ['from_m', 'to_m', 'torque_Nm', 'shear_stress_Pa', 'twist_rad', 'yield_ratio']) expect(j.sides[0].segments[0]).toHaveProperty(key);
  });

  it('a bad case file exits 2 with file:line:column and no stack trace', () => {
    const p = spawnSync(process.execPath, [bin, 'check', fileURLToPath(new URL('../data/bad-units.yaml', import.meta.url))], { encoding: 'utf8' });
    expect(p.status).toBe(2);
    expect(p.stdout).toBe('');
    expect(p.stderr).toMatch(/bad-units\.yaml:12:17 shaft\.segments\[0\]\.diameter: "50" has no unit/);
    expect(p.stderr).not.toMatch(/\n\s+at /);
  });

  it('a missing case file exits 2 with a plain message', async () => {
    const r = await cli('check', 'no/such/case.yaml');
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/no\/such\/case\.yaml: cannot read the case file \(no such file\)/);
  });

  it('materials lists at least twelve materials with their sources', async () => {
    const r = await cli('materials', '--json');
    const list = JSON.parse(r.out);
    expect(list.length).toBeGreaterThanOrEqual(12);
    for (const m of list) expect(m.source).toMatch(/\w/);
  });
});
