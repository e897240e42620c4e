import { describe, expect, it } from 'vitest';
import { sourceWithoutFlags } from '../../src/views/source-words.ts';
import { MATERIAL_LIBRARY } from '../../src/materials/library.ts';

describe('sourceWithoutFlags', () => {
  it('names the published source without the per-value flags, and says a value was entered from memory', () => {
    expect(
      sourceWithoutFlags(
        'strengths: Shigley 9th ed. Table A-20, estimated ASTM minimum (from memory, confident; reduction of area from memory, verify); elastic constants and density: Shigley 9th ed. Table A-5 (from memory, confident)',
      ),
    ).toEqual({
      text: 'strengths: Shigley 9th ed. Table A-20, estimated ASTM minimum; elastic constants and density: Shigley 9th ed. Table A-5',
      fromMemory: true,
    });
    expect(sourceWithoutFlags('strengths: ASTM A536 (the grade names the minimum tensile, yield and elongation; from memory, confident); E, G, density from memory, verify')).toEqual({
      text: 'strengths: ASTM A536 (the grade names the minimum tensile, yield and elongation); E, G, density',
      fromMemory: true,
    });
    expect(sourceWithoutFlags('NIST Special Publication 811 (2008), Appendix B.8')).toEqual({ text: 'NIST Special Publication 811 (2008), Appendix B.8', fromMemory: false });
  });

  it("leaves no flag in any built-in material's source, and keeps a source named", () => {
    for (const m of MATERIAL_LIBRARY) {
      const s = sourceWithoutFlags(m.source);
      expect(s.text, m.key).not.toMatch(/memory|confident|verify/);
      expect(s.text.length, m.key).toBeGreaterThan(10);
    }
  });
});
