import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runMain, type Io } from '../../src/cli/main.ts';

function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const io: Io = { out: (t) => (out += t), err: (t) => (err += t) };
  return runMain(args, io).then((code) => ({ code, out, err }));
}

describe('shaftcase check on the sample cases, past yield', () => {
  it('the granulator reads its 4° twist as less than the recorded speed explains, with its belt slip followed in time (the belts slipped in its story)', async () => {
    const { code, out } = await run(['check', 'sample-cases/granulator-tramp-metal.yaml']);
    expect(code).toBe(0);
    expect(out).toMatch(/Past yield/);
    expect(out).toMatch(/Permanent twist between "drive sheave" and "rotor": measured 4°/);
    expect(out).toMatch(/Read-back: LESS than the recorded speed explains/);
    expect(out).toMatch(/the belt at "drive sheave" \(slip torque .*\) slipped/);
    expect(out).toMatch(/energy was taken somewhere the case does not describe/);
  });

  it('the exhaust fan (US units) predicts fracture at the sheave seat and agrees with its transverse fracture', async () => {
    const { code, out } = await run(['check', 'sample-cases/exhaust-fan-seized-impeller.yaml']);
    expect(code).toBe(0);
    expect(out).toMatch(/lbf·ft/);
    expect(out).toMatch(/^Finding: FRACTURE PREDICTED \(energy method\): side A, "sheave seat"/m);
    expect(out).toMatch(/Agrees: Fracture is predicted in ductile material/);
    expect(out).toMatch(/stated in the case|CONSISTENT/);
  });

  it('--json gives plastic and observed in SI for the US-units case', async () => {
    const { out } = await run(['check', '--json', 'sample-cases/exhaust-fan-seized-impeller.yaml']);
    const j = JSON.parse(out);
    expect(j.verdict).toBe('fracture predicted');
    expect(j.plastic.verdict).toBe('fracture predicted');
    expect(j.speed_rad_s).toBeCloseTo((1180 * 2 * Math.PI) / 60, 9);
    expect(j.observed[0].finding).toBe('consistent');
    expect(j.observed[0].speed_band_basis).toBe('case');
    expect(j.observed_fracture.agreement).toBe('agrees');
  });

  it('both sample cases say they are invented demo data', () => {
    for (const f of ['granulator-tramp-metal.yaml', 'exhaust-fan-seized-impeller.yaml']) {
      expect(readFileSync(`sample-cases/${f}`, 'utf8')).toMatch(/^# INVENTED DEMO DATA/);
    }
  });
});

describe('the check path stays light', () => {
  /** Every src file the check command imports, followed through relative imports. */
  function importGraph(file: string, seen = new Set<string>()): Set<string> {
    if (seen.has(file)) return seen;
    seen.add(file);
    const text = readFileSync(file, 'utf8');
    for (const m of text.matchAll(/^import[^'"]*['"]([^'"]+)['"]/gm)) {
      if (m[1].startsWith('.')) importGraph(resolve(dirname(file), m[1]), seen);
      else seen.add(m[1]);
    }
    return seen;
  }

  it('shaftcase check imports neither @observablehq/plot nor linkedom', () => {
    // The check command's own modules (the CLI entry loads each command only when it runs).
    const graph = [...importGraph(resolve('src/cli/commands/check.ts'))];
    expect(graph.some((f) => f.endsWith('src/results/analyse-plastic.ts'))).toBe(true);
    expect(graph).not.toContain('@observablehq/plot');
    expect(graph).not.toContain('linkedom');
  });
});
