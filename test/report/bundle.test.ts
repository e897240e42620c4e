import { createHash } from 'node:crypto';
import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { buildBundle, manifest } from '../../src/report/bundle.ts';

const enc = (s: string) => new TextEncoder().encode(s);
const files = [
  { path: 'case.yaml', data: enc('case: {}\n') },
  { path: 'reports/2026-12-01/report.md', data: enc('# Report\n') },
  { path: 'photos/a b.png', data: new Uint8Array([137, 80, 78, 71, 0, 255]) },
];
const DATE = new Date('2026-12-01T10:20:30Z');

describe('buildBundle', () => {
  it("the zip holds every file and a MANIFEST.txt whose hashes are the files' real SHA-256", async () => {
    const zip = await JSZip.loadAsync(await buildBundle(files, DATE));
    const names = Object.keys(zip.files).sort();
    expect(names).toEqual(['MANIFEST.txt', 'case.yaml', 'photos/a b.png', 'reports/2026-12-01/report.md']);
    const lines = (await zip.file('MANIFEST.txt')!.async('string')).trimEnd().split('\n');
    expect(lines).toHaveLength(3);
    for (const line of lines) {
      const [, hash, path] = /^([0-9a-f]{64}) {2}(.+)$/.exec(line)!;
      const data = await zip.file(path)!.async('uint8array');
      expect(hash).toBe(createHash('sha256').update(data).digest('hex'));
    }
  });

  it('the same files and date give the same zip, byte for byte, whatever their order', async () => {
    const a = await buildBundle(files, DATE);
    const b = await buildBundle([...files].reverse(), DATE);
    expect(Buffer.from(a).equals(Buffer.from(b))).toBe(true);
  });

  it('manifest lists files sorted by path in the format sha256sum -c reads', () => {
    // SHA-256 of the empty string (FIPS 180-4 test vectors; from memory, confident).
    expect(
      manifest([
        { path: 'b', data: enc('') },
        { path: 'a', data: enc('') },
      ]),
    ).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855  a\ne3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855  b\n');
  });

  it('buildBundle refuses a path that would leave the bundle', async () => {
    await expect(buildBundle([{ path: '../x', data: enc('') }], DATE)).rejects.toThrow(/must stay inside the bundle: \.\.\/x/);
  });
});

describe('safeEntryPath(path) and distinctEntries(files)', () => {
  it('keeps every entry inside the zip and legal on every platform', async () => {
    const { safeEntryPath } = await import('../../src/report/bundle.ts');
    expect(safeEntryPath('..\\..\\evil.yaml')).toBe('evil.yaml');
    expect(safeEntryPath('photos/../../x.jpg')).toBe('x.jpg');
    expect(safeEntryPath('/etc/passwd')).toBe('etc/passwd');
    expect(safeEntryPath('C:\\Windows\\a.yaml')).toBe('C_/Windows/a.yaml');
    expect(safeEntryPath('a<b>|?.yaml')).toBe('a_b___.yaml');
    expect(safeEntryPath('CON.yaml')).toBe('_CON.yaml');
    expect(safeEntryPath('name. ')).toBe('name');
    expect(safeEntryPath('..')).toBe('_');
  });

  it("no file takes MANIFEST.txt's name or another's, compared without case", async () => {
    const { distinctEntries } = await import('../../src/report/bundle.ts');
    const d = new Uint8Array();
    expect(
      distinctEntries([
        { path: 'a.jpg', data: d },
        { path: 'A.JPG', data: d },
        { path: 'MANIFEST.txt', data: d },
        { path: 'README', data: d },
        { path: 'readme', data: d },
      ]).map((f) => f.path),
    ).toEqual(['a.jpg', 'A-2.JPG', 'MANIFEST-2.txt', 'README', 'readme-2']);
  });
});
