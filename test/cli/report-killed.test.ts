import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { BIN, expectNothingHalfWritten, expectTidy, hidden, runReport, visible } from '../helpers/killed-report.ts';
import { copyToTemp } from '../io/io-fixtures.ts';

const ONE_DISC = fileURLToPath(new URL('../data/one-disc.yaml', import.meta.url));

// A real `report` process killed (SIGKILL) at the two moments that matter most: its zip complete in
// the hidden folder, and its folder just renamed into place. Every other step, and kills after a
// time, are in test/slow/report-killed.test.ts. `npm test` builds dist/ first.
describe.skipIf(!existsSync(BIN))('shaftcase report killed while it writes', () => {
  it('leaves nothing visible or a complete folder with its zip, and the next run cleans up after it', async () => {
    const file = copyToTemp(ONE_DISC);
    const reports = join(dirname(file), 'reports');

    const beforeRename = await runReport(file, { killAfter: 'writeFileSync:.bundle.zip.pending' });
    expect(beforeRename.signal).toBe('SIGKILL');
    expect(await expectNothingHalfWritten(reports, [], 'one-disc.yaml')).toBe('nothing');
    const leftover = hidden(reports);
    expect(leftover).toEqual([expect.stringMatching(/^\.T-1-2026-05-28\.tmp-\d+-[a-z0-9]+$/)]);

    const afterRename = await runReport(file, { killAfter: 'renameSync' });
    expect(afterRename.signal).toBe('SIGKILL');
    // The second run removed the first one's hidden folder before it was killed itself.
    expect(hidden(reports)).toEqual([]);
    expect(await expectNothingHalfWritten(reports, [], 'one-disc.yaml')).toBe('zip not yet beside');

    const whole = await runReport(file);
    expect(whole.stderr).toBe('');
    expect(whole.status).toBe(0);
    expect(visible(reports)).toEqual(['T-1-2026-05-28', 'T-1-2026-05-28-2', 'T-1-2026-05-28-2.zip', 'T-1-2026-05-28.zip']);
    await expectTidy(reports, 'one-disc.yaml');
  });
});
