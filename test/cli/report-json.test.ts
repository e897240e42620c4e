import { copyFileSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { tempFolder } from '../io/io-fixtures.ts';
import { FIXED_NOW } from '../report/report-fixtures.ts';
import { cli } from './run-cli.ts';

describe('shaftcase report --json', () => {
  it('prints what it wrote as one JSON object: the folder, the zip, each file, the one to open and the finding check --json gives', async () => {
    const file = join(tempFolder(), 'case.yaml');
    copyFileSync(new URL('../data/one-disc.yaml', import.meta.url), file);
    const run = await cli(['report', '--json', file], FIXED_NOW);
    expect(run.code, run.err).toBe(0);
    const j = JSON.parse(run.out);
    expect(j.schema_version).toBe(2);
    expect(j.report.folder).toMatch(/reports[\\/]T-1-2026-12-01$/);
    expect(j.report.zip).toMatch(/reports[\\/]T-1-2026-12-01\.zip$/);
    expect(j.report.files).toEqual(expect.arrayContaining(['report.md', 'report.html', 'results.json']));
    for (const f of j.report.files) expect(existsSync(join(j.report.folder, f)), f).toBe(true);
    expect(existsSync(j.report.zip)).toBe(true);
    expect(j.finding).toEqual(JSON.parse((await cli(['check', '--json', file])).out).finding);
  });
});
