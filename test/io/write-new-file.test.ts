import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { writeNewFile } from '../../src/io/write-new-file.ts';
import { tempFolder } from './io-fixtures.ts';

describe('writeNewFile', () => {
  it('writeNewFile writes a file whole under its name and leaves no temporary file', () => {
    const dir = tempFolder();
    writeNewFile(join(dir, 'a.txt'), 'hello');
    expect(readFileSync(join(dir, 'a.txt'), 'utf8')).toBe('hello');
    expect(readdirSync(dir)).toEqual(['a.txt']);
  });

  it('writeNewFile refuses a name that is taken (EEXIST), keeps the file there as it was and leaves no temporary file', () => {
    const dir = tempFolder();
    writeFileSync(join(dir, 'a.txt'), 'mine');
    expect(() => writeNewFile(join(dir, 'a.txt'), 'other')).toThrow(expect.objectContaining({ code: 'EEXIST' }));
    expect(readFileSync(join(dir, 'a.txt'), 'utf8')).toBe('mine');
    expect(readdirSync(dir)).toEqual(['a.txt']);
  });
});
