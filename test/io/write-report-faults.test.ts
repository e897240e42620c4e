import { chmodSync, linkSync, mkdirSync, readdirSync, readFileSync, statSync, utimesSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import JSZip from 'jszip';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { SystemFault } from '../../src/io/system-fault.ts';
import { tidyReports, writeReport, type WriteReportInput } from '../../src/io/write-report.ts';
import { tempFolder } from './io-fixtures.ts';

// Every fs function the writer uses passes through, until a test makes one fail.
vi.mock('node:fs', async (importOriginal) => {
  const fs = await importOriginal<typeof import('node:fs')>();
  return { ...fs, writeFileSync: vi.fn(fs.writeFileSync), linkSync: vi.fn(fs.linkSync) };
});

afterEach(() => vi.mocked(writeFileSync).mockRestore?.());

function input(dir: string, caseName = 'case.yaml'): WriteReportInput {
  const caseFile = join(dir, caseName);
  writeFileSync(caseFile, 'case: {}\n');
  return { caseFile, caseText: 'case: {}\n', photos: [], files: [{ path: 'report.md', data: '# R\n' }], caseId: 'T-1', date: '2026-12-01', ranAt: new Date('2026-12-01T10:20:30Z') };
}

const enospc = () => Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });

describe('writeReport under file-system faults', () => {
  it('a "reports" that is a file: one line saying so, a SystemFault, nothing written', async () => {
    const dir = tempFolder();
    writeFileSync(join(dir, 'reports'), 'not a folder');
    const run = writeReport(input(dir));
    await expect(run).rejects.toBeInstanceOf(SystemFault);
    await expect(writeReport(input(dir))).rejects.toThrow(/^cannot write the reports folder .*reports: a file stands where a folder must be; move that file away \(EEXIST\); nothing was written$/);
    expect(readdirSync(dir).sort()).toEqual(['case.yaml', 'reports']);
  });

  it.skipIf(process.getuid?.() === 0)('a read-only case folder: permission denied, nothing written', async () => {
    const dir = tempFolder();
    const inp = input(dir);
    chmodSync(dir, 0o555);
    try {
      await expect(writeReport(inp)).rejects.toThrow(/permission denied.*\(EACCES\); nothing was written/);
    } finally {
      chmodSync(dir, 0o755);
    }
    expect(readdirSync(dir)).toEqual(['case.yaml']);
  });

  it('a full disk while the zip is written: one line, and no folder, no zip, no temporary file', async () => {
    const dir = tempFolder();
    const real = vi.mocked(writeFileSync).getMockImplementation()!;
    vi.mocked(writeFileSync).mockImplementation((path, ...rest) => {
      if (String(path).endsWith('.bundle.zip.pending')) throw enospc();
      return real(path, ...rest);
    });
    await expect(writeReport(input(dir))).rejects.toThrow(/the disk is full; free some space and run it again \(ENOSPC\)/);
    vi.mocked(writeFileSync).mockImplementation(real);
    expect(readdirSync(join(dir, 'reports'))).toEqual([]);
  });

  it('a run stopped between the folder and its zip: the next run puts the zip in place', async () => {
    const dir = tempFolder();
    vi.mocked(linkSync).mockImplementationOnce(() => {
      throw new Error('killed');
    });
    await expect(writeReport(input(dir))).rejects.toThrow('killed');
    expect(readdirSync(join(dir, 'reports'))).toEqual(['T-1-2026-12-01']);
    const second = await writeReport(input(dir));
    expect(readdirSync(join(dir, 'reports')).sort()).toEqual(['T-1-2026-12-01', 'T-1-2026-12-01-2', 'T-1-2026-12-01-2.zip', 'T-1-2026-12-01.zip']);
    expect(readdirSync(join(dir, 'reports', 'T-1-2026-12-01'))).toEqual(['report.md']);
    const names = Object.keys((await JSZip.loadAsync(readFileSync(join(dir, 'reports', 'T-1-2026-12-01.zip')))).files);
    expect(names).toContain('reports/T-1-2026-12-01/report.md');
    expect(second.folder).toMatch(/T-1-2026-12-01-2$/);
  });

  it("hidden temporary folders of ended runs are removed; a running run's and the reports stay", () => {
    const dir = tempFolder();
    const reports = join(dir, 'reports');
    mkdirSync(join(reports, '.2026-11-30.tmp-999999999-abc123'), { recursive: true });
    writeFileSync(join(reports, '.2026-11-30.zip.tmp-999999999-def456'), 'x');
    mkdirSync(join(reports, `.2026-12-01.tmp-${process.pid}-live1`));
    const old = join(reports, `.2026-01-01.tmp-${process.pid}-old1`);
    mkdirSync(old);
    utimesSync(old, new Date('2026-01-01'), new Date('2026-01-01'));
    mkdirSync(join(reports, '2026-11-30'));
    tidyReports(reports);
    expect(readdirSync(reports).sort()).toEqual([`.2026-12-01.tmp-${process.pid}-live1`, '2026-11-30']);
    expect(statSync(join(reports, '2026-11-30')).isDirectory()).toBe(true);
  });
});

describe("writeReport: the zip's entry names", () => {
  it('a case file named with backslashes and ".." becomes a plain entry inside the zip', async () => {
    const dir = tempFolder();
    const { zip } = await writeReport(input(dir, '..\\..\\evil.yaml'));
    const names = Object.keys((await JSZip.loadAsync(readFileSync(zip))).files).sort();
    expect(names).toEqual(['MANIFEST.txt', 'evil.yaml', 'reports/T-1-2026-12-01/report.md']);
  });

  it("a case file named MANIFEST.txt (in any case) cannot take the manifest's name", async () => {
    const dir = tempFolder();
    const { zip } = await writeReport(input(dir, 'manifest.TXT'));
    const z = await JSZip.loadAsync(readFileSync(zip));
    expect(Object.keys(z.files).sort()).toEqual(['MANIFEST.txt', 'manifest-2.TXT', 'reports/T-1-2026-12-01/report.md']);
    expect(await z.file('manifest-2.TXT')!.async('string')).toBe('case: {}\n');
    expect(await z.file('MANIFEST.txt')!.async('string')).toMatch(/ {2}manifest-2\.TXT\n/);
  });
});
