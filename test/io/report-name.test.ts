import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fileSafeId, MAX_ID_IN_NAME, reportBaseName } from '../../src/io/report-name.ts';

describe("a report's file name from the case id", () => {
  it('reportBaseName is the id made safe, a dash, and the date', () => {
    expect(reportBaseName('DEMO-GR-0117', '2026-12-02')).toBe('DEMO-GR-0117-2026-12-02');
  });

  it('fileSafeId keeps letters, digits, dot, underscore and dash, and turns each run of anything else into one dash', () => {
    expect(fileSafeId('WO 20931/B')).toBe('WO-20931-B');
    expect(fileSafeId('C:\\cases\\7')).toBe('C-cases-7');
    expect(fileSafeId('Müller  Ø55 mm')).toBe('Muller-55-mm');
    expect(fileSafeId('case_1.rev2')).toBe('case_1.rev2');
  });

  it('never gives a hidden name, "..", an empty name or one longer than the limit', () => {
    expect(fileSafeId('.hidden')).toBe('hidden');
    expect(fileSafeId('..')).toBe('case');
    expect(fileSafeId('///')).toBe('case');
    expect(fileSafeId('日本')).toBe('case');
    expect(fileSafeId('x'.repeat(200))).toHaveLength(MAX_ID_IN_NAME);
  });

  it('for any id: only safe characters, no leading or trailing dot or dash, at most the limit', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 120 }), (id) => {
        const s = fileSafeId(id);
        expect(s).toMatch(/^[A-Za-z0-9_]([A-Za-z0-9._-]*[A-Za-z0-9_])?$/);
        expect(s.length).toBeLessThanOrEqual(MAX_ID_IN_NAME);
      }),
      { numRuns: 300 },
    );
  });
});
