import { describe, expect, it } from 'vitest';
import { nextReportName, photoHref } from '../../src/report/layout.ts';

describe('report layout', () => {
  it('nextReportName takes the base (case id and date), then -2, -3 … past any folder or zip of that name', () => {
    expect(nextReportName('GR-1-2026-12-01', new Set())).toBe('GR-1-2026-12-01');
    expect(nextReportName('GR-1-2026-12-01', new Set(['GR-1-2026-12-01']))).toBe('GR-1-2026-12-01-2');
    expect(nextReportName('GR-1-2026-12-01', new Set(['GR-1-2026-12-01.zip']))).toBe('GR-1-2026-12-01-2');
    expect(nextReportName('GR-1-2026-12-01', new Set(['GR-1-2026-12-01', 'GR-1-2026-12-01-2.zip', '2026-11-30']))).toBe('GR-1-2026-12-01-3');
  });

  it('photoHref links back to the case folder with every path segment encoded', () => {
    expect(photoHref('photos/key way (1).jpg')).toBe('../../photos/key%20way%20(1).jpg');
    expect(photoHref('./photos\\b[2].png')).toBe('../../photos/b%5B2%5D.png');
  });
});
