// The package as a user gets it: packed, installed into a fresh project from the tarball (its
// dependencies from npm's cache, offline), imported by name, type-checked against its declarations.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../', import.meta.url));
const work = mkdtempSync(join(tmpdir(), 'shaftcase-pack-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

describe('the packed package', () => {
  it('installs from its tarball and gives analyseCase, the finding and their types by the package name', () => {
    execFileSync('npx', ['tsc', '-p', 'tsconfig.json'], { cwd: root, stdio: 'pipe' });
    execFileSync(process.execPath, ['scripts/bundle.mjs'], { cwd: root, stdio: 'pipe' });
    execFileSync('npm', ['pack', '--ignore-scripts', '--pack-destination', work], { cwd: root, stdio: 'pipe' });
    const tarball = readdirSync(work).find((f) => f.endsWith('.tgz'))!;
    const app = join(work, 'app');
    execFileSync('mkdir', ['-p', app]);
    writeFileSync(join(app, 'package.json'), JSON.stringify({ name: 'app', private: true, type: 'module', overrides: { '@uwdata/flechette': '2.6.0' } }));
    execFileSync('npm', ['install', '--prefer-offline', '--ignore-scripts', '--no-audit', '--no-fund', join(work, tarball), `${join(root, 'node_modules', '@types', 'node')}`], {
      cwd: app,
      stdio: 'pipe',
    });
    expect(readdirSync(join(app, 'node_modules', 'shaftcase'))).not.toContain('bench');
    writeFileSync(
      join(app, 'use.ts'),
      [
        "import { analyseCase, decideFinding, parseCase, SCHEMA_VERSION, type Finding } from 'shaftcase';",
        "const text = 'case: { id: T }\\nspeed: 300 rpm\\nstop: { at: jam }\\nshaft:\\n  material: aisi-1045-cd\\n  segments:\\n    - { length: 500 mm, diameter: 40 mm }\\nstations:\\n  - { name: jam, at: 0 mm }\\n  - { name: disc, at: 500 mm, parts: [{ shape: inertia, inertia: 0.5 kg*m^2 }] }\\n';",
        'const f: Finding = decideFinding(analyseCase(parseCase(text)));',
        'console.log(JSON.stringify({ verdict: f.verdict, ratio: f.yieldRatio, schema: SCHEMA_VERSION }));',
      ].join('\n'),
    );
    writeFileSync(
      join(app, 'tsconfig.json'),
      JSON.stringify({ compilerOptions: { module: 'NodeNext', moduleResolution: 'NodeNext', strict: true, outDir: 'out', types: ['node'], skipLibCheck: false }, files: ['use.ts'] }),
    );
    execFileSync(join(root, 'node_modules', '.bin', 'tsc'), ['-p', '.'], { cwd: app, stdio: 'pipe' });
    const out = JSON.parse(execFileSync(process.execPath, [join(app, 'out', 'use.js')], { cwd: app, encoding: 'utf8' }));
    expect(out.schema).toBe(2);
    expect(['elastic', 'yielded locally', 'yielded', 'fracture predicted']).toContain(out.verdict);
    expect(out.ratio).toBeGreaterThan(0);
    // The command as installed: the bundled CLI (dist/cli) on one of the shipped sample cases.
    const sample = join(app, 'node_modules', 'shaftcase', 'sample-cases', 'exhaust-fan-seized-impeller.yaml');
    const checked = JSON.parse(execFileSync(join(app, 'node_modules', '.bin', 'shaftcase'), ['check', '--json', '--samples', '0', sample], { cwd: app, encoding: 'utf8' }));
    expect(checked.finding.verdict).toBeTypeOf('string');
  });
});
