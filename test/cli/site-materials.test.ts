import { createHash } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { tempFolder } from '../io/io-fixtures.ts';
import { cli } from './run-cli.ts';

const CASE = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');
// A site's mill certificate for the built-in key (invented numbers): a stronger bar than the library's minimum.
const SITE = `materials:
  aisi-1045-cd:
    name: 1045 CD from the plant's mill certificates (invented)
    shear_modulus: 79.3 GPa
    elastic_modulus: 207 GPa
    density: 7850 kg/m^3
    yield_strength: 600 MPa
    tensile_strength: 700 MPa
    elongation: 14 %
    source: mill certificates 2026 (invented)
`;
const sha = (t: string) => createHash('sha256').update(t).digest('hex');

/** A plant folder: materials.yaml at its top, the case two folders down. */
function plant(site = SITE, caseText = CASE): { dir: string; caseDir: string } {
  const dir = tempFolder();
  writeFileSync(join(dir, 'materials.yaml'), site);
  const caseDir = join(dir, 'cases', 'INC-1');
  mkdirSync(caseDir, { recursive: true });
  writeFileSync(join(caseDir, 'case.yaml'), caseText);
  return { dir, caseDir };
}

describe('the site materials catalogue', () => {
  it('materials.yaml up the tree takes precedence over the built-in library, with a warning, and is recorded with its SHA-256', async () => {
    const { caseDir } = plant();
    const j = JSON.parse((await cli(['check', '--json', caseDir])).out);
    expect(j.materials_catalogue).toEqual({ file: 'materials.yaml', sha256: sha(SITE) });
    expect(j.shear_yield_Pa).toBeCloseTo(600e6 / Math.sqrt(3), -3);
    expect(j.warnings).toContain('The site catalogue\'s material "aisi-1045-cd" (materials.yaml) overrides the built-in material of that name.');
  });

  it("the case's own materials take precedence over the site's, with a warning", async () => {
    const own = CASE.replace('shaft:\n', 'materials:\n  aisi-1045-cd:\n    shear_modulus: 79.3 GPa\n    yield_strength: 500 MPa\n    tensile_strength: 650 MPa\n    density: 7850 kg/m^3\nshaft:\n');
    const { caseDir } = plant(SITE, own);
    const j = JSON.parse((await cli(['check', '--json', caseDir])).out);
    expect(j.shear_yield_Pa).toBeCloseTo(500e6 / Math.sqrt(3), -3);
    expect(j.warnings).toContain('The case\'s material "aisi-1045-cd" overrides the one of that name in the site catalogue materials.yaml.');
  });

  it('without a catalogue the library is used and nothing is recorded', async () => {
    const dir = tempFolder();
    writeFileSync(join(dir, 'case.yaml'), CASE);
    const j = JSON.parse((await cli(['check', '--json', dir])).out);
    expect(j.materials_catalogue).toBeNull();
    expect(j.warnings.join(' ')).not.toMatch(/overrides/);
  });

  it('--materials FILE names the catalogue instead of the one up the tree', async () => {
    const { caseDir } = plant();
    const other = join(tempFolder(), 'site-b.yaml');
    const textB = SITE.replace('600 MPa', '640 MPa');
    writeFileSync(other, textB);
    const j = JSON.parse((await cli(['check', '--json', '--materials', other, caseDir])).out);
    expect(j.materials_catalogue).toEqual({ file: 'site-b.yaml', sha256: sha(textB) });
    expect(j.shear_yield_Pa).toBeCloseTo(640e6 / Math.sqrt(3), -3);
  });

  it("a mistake in the catalogue is refused with the catalogue's name, line and field, exit 2", async () => {
    const { caseDir } = plant(SITE.replace('600 MPa', '600'));
    const r = await cli(['check', caseDir]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/materials\.yaml:7:\d+ materials\.aisi-1045-cd\.yield_strength: /);
    expect(r.err).toContain(join(caseDir, '..', '..', 'materials.yaml'));
  });

  it('the report records the catalogue in results.json and bundles it beside the case file', async () => {
    const { caseDir } = plant();
    expect((await cli(['report', caseDir])).code).toBe(0);
    const results = JSON.parse(readFileSync(join(caseDir, 'reports', 'T-1-2026-12-01', 'results.json'), 'utf8'));
    expect(results.materials_catalogue.sha256).toBe(sha(SITE));
    const zip = await JSZip.loadAsync(readFileSync(join(caseDir, 'reports', 'T-1-2026-12-01.zip')));
    expect(await zip.file('materials.yaml')!.async('string')).toBe(SITE);
    expect(zip.file('case.yaml')).not.toBeNull();
  });
});
