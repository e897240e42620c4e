import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import JSZip from 'jszip';
import { describe, expect, it, vi } from 'vitest';
import { copyToTemp } from '../io/io-fixtures.ts';
import { SAMPLE } from '../report/report-fixtures.ts';
import { cli } from './run-cli.ts';

// The browser is replaced here (the real one is exercised once, in test/io/chromium.test.ts).
const printPdf = vi.hoisted(() => vi.fn());
vi.mock('../../src/io/chromium.ts', async (importActual) => ({ ...(await importActual<object>()), printPdf }));

describe('shaftcase report --pdf', () => {
  it("--pdf adds report.pdf to the folder and the zip, on the paper of the case's units", async () => {
    printPdf.mockResolvedValueOnce(new TextEncoder().encode('%PDF-1.4 test'));
    const file = copyToTemp(SAMPLE);
    const run = await cli(['report', '--pdf', file]);
    expect(run.code).toBe(0);
    expect(printPdf).toHaveBeenLastCalledWith(expect.stringContaining('<!DOCTYPE html>'), 'A4');
    const folder = join(dirname(file), 'reports', 'DEMO-GR-0117-2026-12-01');
    expect(readFileSync(join(folder, 'report.pdf'), 'utf8')).toBe('%PDF-1.4 test');
    const zip = await JSZip.loadAsync(readFileSync(`${folder}.zip`));
    expect(zip.file('reports/DEMO-GR-0117-2026-12-01/report.pdf')).not.toBeNull();
  });

  it('without Chromium, --pdf says so and how to install it, and writes the rest of the report', async () => {
    const { ChromiumMissing } = await vi.importActual<typeof import('../../src/io/chromium.ts')>('../../src/io/chromium.ts');
    printPdf.mockRejectedValueOnce(new ChromiumMissing(undefined));
    const file = copyToTemp(SAMPLE);
    const run = await cli(['report', '--pdf', file]);
    expect(run.code).toBe(0);
    expect(run.err).toBe(
      "report.pdf not written: Chromium was not found at /usr/lib/chromium/chromium or /usr/bin/chromium; install Debian's package (sudo apt-get install chromium), or name a Chromium or Chrome executable in SHAFTCASE_CHROMIUM. The rest of the report is written; print report.html from a browser instead.\n",
    );
    const folder = join(dirname(file), 'reports', 'DEMO-GR-0117-2026-12-01');
    expect(existsSync(join(folder, 'report.html'))).toBe(true);
    expect(existsSync(join(folder, 'report.pdf'))).toBe(false);
  });
});
