import { mkdirSync, symlinkSync, writeFileSync } from 'node:fs';
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

  it('a missing photo is a case error naming the photo\'s line in the case file', () => {
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
