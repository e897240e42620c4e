import { describe, expect, it } from 'vitest';
import { ep5Case, ep5CaseText } from '../data/ep5-case.ts';
import { parseCase } from '../../src/case/parse-case.ts';

// The case keys this work adds: materials.NAME.fracture_strain (src/case/read-materials.ts) and
// analysis.hardening (src/case/parse-case.ts). Line numbers follow ep5CaseText's layout.
describe('case keys for the analysis past yield', () => {
  it('reads materials.NAME.fracture_strain as a plain shear strain', () => {
    const c = ep5Case({ material: ['shear_modulus: 79.3 GPa', 'yield_strength: 530 MPa', 'fracture_strain: 0.6'] });
    expect(c.materials['ep5-steel'].fractureStrain).toBe(0.6);
  });

  it('accepts fracture_strain as a percentage too', () => {
    const c = ep5Case({ material: ['shear_modulus: 79.3 GPa', 'yield_strength: 530 MPa', 'fracture_strain: 60 %'] });
    expect(c.materials['ep5-steel'].fractureStrain).toBeCloseTo(0.6, 12);
  });

  it('rejects a negative fracture_strain with its line and field', () => {
    const text = ep5CaseText({ material: ['shear_modulus: 79.3 GPa', 'yield_strength: 530 MPa', 'fracture_strain: -0.2'] });
    const line = text.split('\n').findIndex((l) => l.includes('fracture_strain')) + 1;
    expect(() => parseCase(text, 'ep5.yaml')).toThrow(new RegExp(`ep5\\.yaml:${line}:\\d+ materials\\.ep5-steel\\.fracture_strain: .*greater than zero`));
  });

  it('defaults analysis.hardening to none and reads linear', () => {
    expect(ep5Case().analysis.hardening).toBe('none');
    expect(ep5Case({ analysis: ['hardening: linear'] }).analysis.hardening).toBe('linear');
  });

  it('rejects an unknown hardening with its line, the allowed values and a did-you-mean', () => {
    const text = ep5CaseText({ analysis: ['hardening: lineer'] });
    const line = text.split('\n').findIndex((l) => l.includes('hardening')) + 1;
    expect(() => parseCase(text, 'ep5.yaml')).toThrow(new RegExp(`ep5\\.yaml:${line}:\\d+ analysis\\.hardening: "lineer" is not one of none, linear; did you mean "linear"\\?`));
  });
});
