import { describe, expect, it } from 'vitest';
import { observationsSection } from '../../../src/report/sections/observations.ts';
import { fixture } from '../report-fixtures.ts';

describe('observationsSection', () => {
  it('says what to record when the case records nothing', () => {
    const f = fixture('elastic-fan.yaml');
    expect(observationsSection.render(f.ctx)).toMatch(/^The case file records no observations\. Record the key/);
  });

  it("shows the measured twist in the case's units, the fracture, the free text and each photo with its caption", () => {
    const f = fixture('hostile.yaml');
    const md = observationsSection.render(f.ctx)!;
    expect(md).toContain('**Key:** \\<iframe src=javascript:alert(7)>');
    expect(md).toContain('![Photo 1: \\<img src=x onerror=alert(8)> caption](../../photos/a%20b%20(1).png)');
    const sample = fixture('sample');
    const s = observationsSection.render(sample.ctx)!;
    expect(s).toContain('| drive sheave and rotor | 4° | scribe line across the sheave hub');
    expect(s).toContain('**Fracture:** none found');
  });
});
