import { createHash } from 'node:crypto';
import { mkdirSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { writeReport, type WriteReportInput } from '../../src/io/write-report.ts';
import { tempFolder } from './io-fixtures.ts';

/** Every file under `dir` with its SHA-256, by path relative to `dir`. */
function hashes(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  const walk = (d: string) => {
    for (const name of readdirSync(d)) {
      const p = join(d, name);
      if (statSync(p).isDirectory()) walk(p);
      else out[relative(dir, p)] = createHash('sha256').update(readFileSync(p)).digest('hex');
    }
  };
  walk(dir);
  return out;
}

function input(
  dir: string,
  files = [
    { path: 'report.md', data: '# R\n' },
    { path: 'figures/a.svg', data: '<svg/>' },
  ],
  caseId = 'GR-17',
): WriteReportInput {
  const caseFile = join(dir, 'case.yaml');
  writeFileSync(caseFile, 'case: {}\n');
  return { caseFile, caseText: 'case: {}\n', photos: [], files, caseId, date: '2026-12-01', ranAt: new Date('2026-12-01T10:20:30Z') };
}

describe('writeReport', () => {
  it('a report goes to ID-DATE; a second the same day goes to ID-DATE-2 and leaves the first folder and zip untouched', async () => {
    const dir = tempFolder();
    const first = await writeReport(input(dir));
    expect(relative(dir, first.folder)).toBe('reports/GR-17-2026-12-01');
    expect(relative(dir, first.zip)).toBe('reports/GR-17-2026-12-01.zip');
    const before = hashes(join(dir, 'reports'));
    const second = await writeReport(input(dir, [{ path: 'report.md', data: '# changed\n' }]));
    expect(relative(dir, second.folder)).toBe('reports/GR-17-2026-12-01-2');
    const after = hashes(join(dir, 'reports'));
    for (const [path, hash] of Object.entries(before)) expect(after[path], path).toBe(hash);
    expect(readFileSync(join(second.folder, 'report.md'), 'utf8')).toBe('# changed\n');
    expect(readdirSync(join(dir, 'reports')).sort()).toEqual(['GR-17-2026-12-01', 'GR-17-2026-12-01-2', 'GR-17-2026-12-01-2.zip', 'GR-17-2026-12-01.zip']);
  });

  it('reports of two cases in one folder keep apart by their case ids, the id made safe for a file name', async () => {
    const dir = tempFolder();
    const a = await writeReport(input(dir, undefined, 'WO 20931/B'));
    const b = await writeReport(input(dir, undefined, 'Müller:7'));
    expect(relative(dir, a.folder)).toBe('reports/WO-20931-B-2026-12-01');
    expect(relative(dir, b.zip)).toBe('reports/Muller-7-2026-12-01.zip');
    const names = Object.keys((await JSZip.loadAsync(readFileSync(a.zip))).files);
    expect(names).toContain('reports/WO-20931-B-2026-12-01/report.md');
  });

  it('a zip of the day already there, without its folder, still moves the new report on to ID-DATE-2', async () => {
    const dir = tempFolder();
    await writeReport(input(dir));
    rmSync(join(dir, 'reports', 'GR-17-2026-12-01'), { recursive: true });
    const next = await writeReport(input(dir));
    expect(relative(dir, next.folder)).toBe('reports/GR-17-2026-12-01-2');
  });

  it('the zip holds the report folder under reports/NAME/, the case file and the manifest', async () => {
    const dir = tempFolder();
    const { zip } = await writeReport(input(dir));
    const names = Object.keys((await JSZip.loadAsync(readFileSync(zip))).files).sort();
    expect(names).toEqual(['MANIFEST.txt', 'case.yaml', 'reports/GR-17-2026-12-01/figures/a.svg', 'reports/GR-17-2026-12-01/report.md']);
  });

  it('a write that fails half-way leaves no report folder, no zip and no temporary file', async () => {
    const dir = tempFolder();
    // "a" is written as a file, so "a/b" cannot be: the write fails after its first file.
    await expect(
      writeReport(
        input(dir, [
          { path: 'a', data: 'x' },
          { path: 'a/b', data: 'y' },
        ]),
      ),
    ).rejects.toThrow(/ENOTDIR|EEXIST/);
    expect(readdirSync(join(dir, 'reports'))).toEqual([]);
  });

  it('the report folder gets the same permissions as any folder the user makes (not private)', async () => {
    const dir = tempFolder();
    const { folder } = await writeReport(input(dir));
    mkdirSync(join(dir, 'plain'));
    expect(statSync(folder).mode & 0o777).toBe(statSync(join(dir, 'plain')).mode & 0o777);
  });
});
