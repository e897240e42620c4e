import { mkdtempSync, writeFileSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CaseError } from '../../src/case/case-error.ts';
import { loadCase } from '../../src/io/load-case.ts';

const base = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');
const dir = mkdtempSync(join(tmpdir(), 'shaftcase-load-'));

function loadError(name: string, data: string | Uint8Array): string {
  const file = join(dir, name);
  writeFileSync(file, data);
  try {
    loadCase(file);
  } catch (e) {
    if (e instanceof CaseError) return e.message;
    throw e;
  }
  throw new Error('expected a CaseError');
}

describe('loadCase refuses text that is not text', () => {
  it('a file that is not UTF-8 is refused at the line of its first bad byte', () => {
    const bad = Buffer.from(base.replace('id: T-1', 'id: T-1\n  title: Mühle'), 'latin1'); // ü as one byte, 0xFC: not UTF-8
    expect(loadError('latin1.yaml', bad)).toMatch(/latin1\.yaml:4:11: is not UTF-8 text .*save the file as UTF-8/);
  });

  it.each([
    ['NUL', '\u0000'],
    ['ESC', '\u001b[2J'],
    ['a right-to-left override', '\u202e'],
    ['a first-strong isolate', '\u2068'],
    ['a C1 control', '\u009b'],
    ['DEL', '\u007f'],
  ])('%s in a title or a comment is refused with its position', (_, ch) => {
    const msg = loadError('ctl.yaml', base.replace('id: T-1', `id: T-1\n  title: Rotor${ch}stop`));
    expect(msg).toMatch(/ctl\.yaml:4:15: holds the control character U\+[0-9A-F]{4}, which a case file may not hold; remove it/);
    expect(msg).not.toContain(ch);
    expect(loadError('ctl2.yaml', `# note ${ch}\n${base}`)).toMatch(/ctl2\.yaml:1:8: holds the control character/);
  });

  it('tabs in a comment, CRLF line ends and a byte-order mark are fine', () => {
    const file = join(dir, 'ok.yaml');
    writeFileSync(file, `\ufeff# a\tnote\r\n${base.replace(/\n/g, '\r\n')}`);
    expect(loadCase(file).case.meta.id).toBe('T-1');
  });

  it('a case file over 1 MB is refused before it is read', () => {
    expect(loadError('big.yaml', base + '#' + 'x'.repeat(1_000_001))).toMatch(/big\.yaml: the case file is 1\.00 MB, more than the 1 MB/);
  });
});
