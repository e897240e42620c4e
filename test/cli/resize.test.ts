import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runMain } from '../../src/cli/main.ts';

const sample = (f: string) => fileURLToPath(new URL(`../../sample-cases/${f}`, import.meta.url));

async function cli(...argv: string[]) {
  let out = '';
  let err = '';
  const status = await runMain(argv, { out: (t) => (out += t), err: (t) => (err += t) });
  return { status, out, err };
}

/**
 * Every package the module graph from `entry` imports statically, following the project's own
 * relative imports. Dynamic `import()` is left out: that is how the report command loads its
 * plotting code only when it runs.
 */
function packagesImportedFrom(entry: string): Set<string> {
  const seen = new Set<string>();
  const packages = new Set<string>();
  const visit = (file: string) => {
    if (seen.has(file)) return;
    seen.add(file);
    for (const m of readFileSync(file, 'utf8').matchAll(/(?:import|export)[^'"]*?from\s+'([^']+)'/g)) {
      const spec = m[1];
      if (spec.startsWith('.')) visit(resolve(dirname(file), spec));
      else packages.add(spec);
    }
  };
  visit(entry);
  return packages;
}

describe('shaftcase resize', () => {
  it('prints the options table with the cautions for every sample case', async () => {
    for (const f of ['granulator-tramp-metal.yaml', 'screw-conveyor-jam-us.yaml', 'edger-arbor-two-sides.yaml']) {
      const r = await cli('resize', sample(f));
      expect(r.status).toBe(0);
      expect(r.out).toMatch(/Option\s+New size or setting\s+Repeat stress \/ shear yield/);
      expect(r.out).toMatch(/lock out and tag out/);
    }
  });

  it('--factor sets the design factor and --json prints the check object with resize added', async () => {
    const j = JSON.parse((await cli('resize', sample('screw-conveyor-jam-us.yaml'), '--factor', '2', '--json')).out);
    expect(j.resize.factor).toBe(2);
    expect(j.resize.scale_side.s).toBeCloseTo(j.yield_ratio * 2, 12);
    for (const key of ['case_id', 'yield_ratio', 'verdict', 'sides', 'cautions']) expect(j).toHaveProperty(key);
  });

  it("a design factor below 1 is the user's mistake: exit 2 with a plain message", async () => {
    const r = await cli('resize', sample('screw-conveyor-jam-us.yaml'), '--factor', '0.8');
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/give a design factor of 1 or more, such as 1\.5 \(not "0\.8"\)/);
    expect(r.out).toBe('');
  });

  it('a missing case file exits 2', async () => {
    const r = await cli('resize', 'no/such/case.yaml');
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/cannot read the case file/);
  });

  it('the command imports no plotting code (only the report does), so it starts fast', () => {
    const packages = packagesImportedFrom(fileURLToPath(new URL('../../src/cli/main.ts', import.meta.url)));
    expect(packages.has('commander')).toBe(true); // the walk does reach the packages
    expect([...packages].filter((p) => /plot|linkedom|jsdom/.test(p))).toEqual([]);
    // and it would see them: the report's figures do import both.
    const figure = packagesImportedFrom(fileURLToPath(new URL('../../src/report/figures/peak-torque-vs-limiter.ts', import.meta.url)));
    expect(figure.has('@observablehq/plot') && figure.has('linkedom')).toBe(true);
  });
});
