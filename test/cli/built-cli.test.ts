import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { copyToTemp } from '../io/io-fixtures.ts';
import { SAMPLE } from '../report/report-fixtures.ts';

const BIN = fileURLToPath(new URL('../../dist/cli/bin.js', import.meta.url));

// `npm test` builds dist/ first; this runs the CLI as a user would, to check the built report path loads.
describe.skipIf(!existsSync(BIN))('the built CLI', () => {
  it('shaftcase report writes the folder named by SOURCE_DATE_EPOCH and exits 0', () => {
    const file = copyToTemp(SAMPLE);
    // 1780000000 s after 1970-01-01 UTC is 2026-05-28 (derived: 1780000000 / 86400 = 20601.85 days).
    const run = spawnSync(process.execPath, [BIN, 'report', file], { encoding: 'utf8', env: { ...process.env, SOURCE_DATE_EPOCH: '1780000000', TZ: 'UTC' } });
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    expect(readdirSync(join(dirname(file), 'reports')).sort()).toEqual(['DEMO-GR-0117-2026-05-28', 'DEMO-GR-0117-2026-05-28.zip']);
    expect(run.stdout).toMatch(/^Open .*reports\/DEMO-GR-0117-2026-05-28\/report\.html$/m);
  });
});
