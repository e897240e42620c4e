import { describe, expect, it } from 'vitest';
import { textTable } from '../../src/views/text-table.ts';

describe('textTable', () => {
  it('pads each column to its widest cell and rules off the headings', () => {
    expect(
      textTable([
        ['a', 'long heading'],
        ['wide cell', 'x'],
      ]),
    ).toEqual(['a          long heading', '---------  ------------', 'wide cell  x']);
  });
});
