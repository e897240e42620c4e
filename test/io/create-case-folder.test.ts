import { existsSync, readFileSync, statSync, writeFileSync, mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createCaseFolder } from '../../src/io/create-case-folder.ts';
import { tempFolder } from './io-fixtures.ts';

describe('createCaseFolder', () => {
  it("createCaseFolder makes case.yaml from the units' template, photos/ and README.md", () => {
    const dir = join(tempFolder(), 'INC-1');
    const made = createCaseFolder(dir, 'us');
    expect(made.created).toEqual([dir, join(dir, 'photos'), join(dir, 'case.yaml'), join(dir, 'README.md')]);
    expect(statSync(join(dir, 'photos')).isDirectory()).toBe(true);
    expect(readFileSync(join(dir, 'case.yaml'), 'utf8')).toMatch(/^units: us /m);
    expect(readFileSync(join(dir, 'README.md'), 'utf8')).toMatch(/^# Case folder/);
  });

  it("a new case file opens with the editor's schema comment: a relative path to the installed case schema", () => {
    const dir = join(tempFolder(), 'INC-S');
    createCaseFolder(dir, 'metric');
    const first = readFileSync(join(dir, 'case.yaml'), 'utf8').split('\n')[0];
    const m = /^# yaml-language-server: \$schema=(\S+)$/.exec(first);
    expect(m).not.toBeNull();
    expect(m![1].startsWith('/')).toBe(false);
    const schema = JSON.parse(readFileSync(resolve(dir, m![1]), 'utf8'));
    expect(schema.title).toBe('shaftcase case file');
  });

  it('createCaseFolder refuses a folder that holds a case and leaves it as it was', () => {
    const dir = join(tempFolder(), 'INC-2');
    createCaseFolder(dir, 'metric');
    writeFileSync(join(dir, 'case.yaml'), 'mine\n');
    expect(() => createCaseFolder(dir, 'metric')).toThrow(/INC-2\/case\.yaml: a case is already here, and shaftcase new never overwrites one/);
    expect(readFileSync(join(dir, 'case.yaml'), 'utf8')).toBe('mine\n');
  });

  it('createCaseFolder fills a folder of photos without a case, keeping a README already there', () => {
    const dir = join(tempFolder(), 'INC-3');
    mkdirSync(join(dir, 'photos'), { recursive: true });
    writeFileSync(join(dir, 'README.md'), 'my notes\n');
    const made = createCaseFolder(dir, 'metric');
    expect(made.created).toEqual([join(dir, 'case.yaml')]);
    expect(made.kept).toEqual([join(dir, 'README.md')]);
    expect(readFileSync(join(dir, 'README.md'), 'utf8')).toBe('my notes\n');
    expect(existsSync(join(dir, 'case.yaml'))).toBe(true);
  });

  it('createCaseFolder refuses a path that is a file', () => {
    const file = join(tempFolder(), 'x.txt');
    writeFileSync(file, '');
    expect(() => createCaseFolder(file, 'metric')).toThrow(/x\.txt: is a file, not a folder/);
  });
});
