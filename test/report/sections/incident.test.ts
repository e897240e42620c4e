import { describe, expect, it } from 'vitest';
import { incidentSection } from '../../../src/report/sections/incident.ts';
import { fixture } from '../report-fixtures.ts';

describe('incidentSection', () => {
  it('marks what the case does not give as not given, and says when there are no notes', () => {
    const f = fixture('elastic-fan.yaml');
    const md = incidentSection.render(f.ctx)!;
    expect(md).toContain('| Incident | TEST-FAN-1 |');
    expect(md).toContain('| Ticket | *not given* |');
    expect(md).toMatch(/The case file gives no notes\.$/);
  });

  it('keeps the paragraphs of the notes and escapes each', () => {
    const f = fixture('hostile.yaml');
    const md = incidentSection.render(f.ctx)!;
    expect(md).toContain("**Notes from the case file:**\n\n\\<script>document.title='pwned'\\</script>\n\n\\# not a heading - not a list 1. not a list");
  });
});
