import { mkdirSync, symlinkSync, truncateSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CaseError } from '../../src/case/case-error.ts';
import { readPhotos } from '../../src/io/read-photos.ts';
import { TINY_PNG } from '../report/report-fixtures.ts';
import { tempFolder } from './io-fixtures.ts';

const TEXT = `case: { id: T }
observed:
  photos:
    - { path: photos/key.png, caption: key }
    - path: photos/missing.jpg
`;

function caseFolder(): string {
  const dir = tempFolder();
  mkdirSync(join(dir, 'case', 'photos'), { recursive: true });
  writeFileSync(join(dir, 'case', 'case.yaml'), TEXT);
  return join(dir, 'case');
}

describe('readPhotos', () => {
  it('a photo past 15 MB, or photos past 60 MB together, are refused at their line before they are read', () => {
    const dir = caseFolder();
    writeFileSync(join(dir, 'photos', 'key.png'), TINY_PNG);
    writeFileSync(join(dir, 'photos', 'missing.jpg'), '');
    truncateSync(join(dir, 'photos', 'missing.jpg'), 15_000_001); // sparse: no disk is written
    expect(() => readPhotos(join(dir, 'case.yaml'), TEXT, [{ path: 'photos/key.png' }, { path: 'photos/missing.jpg' }])).toThrow(
      /case\.yaml:5:13 observed\.photos\[1\]\.path: "photos\/missing\.jpg" is 15 MB, more than the 15 MB one photo may be; save a smaller copy/,
    );
    const many = Array.from({ length: 5 }, (_, i) => ({ path: `photos/p${i}.jpg` }));
    for (const p of many) {
      writeFileSync(join(dir, p.path), '');
      truncateSync(join(dir, p.path), 14_000_000);
    }
    expect(() => readPhotos(join(dir, 'case.yaml'), TEXT, many)).toThrow(/with "photos\/p4\.jpg" the photos come to 70 MB, more than the 60 MB a case's photos may be together/);
  });

  it('readPhotos reads each photo with its media type and its path inside the case folder', () => {
    const dir = caseFolder();
    writeFileSync(join(dir, 'photos', 'key.png'), TINY_PNG);
    writeFileSync(join(dir, 'photos', 'note.heic'), 'x');
    const files = readPhotos(join(dir, 'case.yaml'), TEXT, [{ path: 'photos/key.png' }, { path: './photos/../photos/note.heic' }]);
    expect(files.map((f) => [f.path, f.mediaType, f.data.length])).toEqual([
      ['photos/key.png', 'image/png', TINY_PNG.length],
      ['photos/note.heic', undefined, 1],
    ]);
  });

  it("a missing photo is a case error naming the photo's line in the case file", () => {
    const dir = caseFolder();
    writeFileSync(join(dir, 'photos', 'key.png'), TINY_PNG);
    const run = () => readPhotos(join(dir, 'case.yaml'), TEXT, [{ path: 'photos/key.png' }, { path: 'photos/missing.jpg' }]);
    expect(run).toThrow(CaseError);
    expect(run).toThrow(/case\.yaml:5:13 observed\.photos\[1\]\.path: no photo file at "photos\/missing\.jpg" \(looked for .*photos\/missing\.jpg\); put the photo in the case folder/);
  });

  it('a photo that leads outside the case folder through a link is refused', () => {
    const dir = caseFolder();
    const outside = join(dir, '..', 'secret.png');
    writeFileSync(outside, TINY_PNG);
    symlinkSync(outside, join(dir, 'photos', 'key.png'));
    expect(() => readPhotos(join(dir, 'case.yaml'), TEXT, [{ path: 'photos/key.png' }])).toThrow(
      /case\.yaml:4:15 observed\.photos\[0\]\.path: "photos\/key\.png" leads outside the case folder \(to .*secret\.png, through a link\); copy the photo itself/,
    );
  });
});
