import { describe, expect, it } from 'vitest';
import { materialTable, stressReading } from '../../../src/report/tables/material-table.ts';
import { inDisplay } from '../../../src/views/display-units.ts';
import { fixture } from '../report-fixtures.ts';

describe('materialTable', () => {
  it('materialTable gives each segment its most stressed piece across both sides of the stop', () => {
    const r = fixture('two-sided-pump.yaml').results;
    const t = materialTable(r);
    // Segment 2 (6–16 in) is cut by the stop at 14 in: its piece on side A and its piece on side B carry different torques.
    const pieces = r.sides.flatMap((s) => s.pieces).filter((p) => p.piece.segment.index === 1);
    expect(pieces).toHaveLength(2);
    const worst = Math.max(...pieces.map((p) => p.shearStress));
    expect(t.rows[1][2]).toBe(inDisplay(worst, 'stress', 'us'));
  });

  it('materialTable says a segment beyond the loaded stations carries no torque, and still shows its strengths', () => {
    const t = materialTable(fixture('sample').results);
    const far = t.rows[4];
    expect(far[0]).toBe('5 far journal');
    expect(far[2]).toBeNull();
    expect(far[7]).toBe('carries no torque');
    // AISI 1045 CD, S_y = 530 MPa (Shigley 9th ed. Table A-20; from memory, confident): 530/√3 = 306 MPa; S_ut = 630 MPa: 0.67 × 630 = 422 MPa.
    expect(far[3]).toBeCloseTo(530 / Math.sqrt(3), 9);
    expect(far[5]).toBeCloseTo(0.67 * 630, 9);
  });

  it('stressReading reads below yield, above yield and above the ultimate estimate', () => {
    expect(stressReading(0.5, 0.4)).toBe('below yield');
    expect(stressReading(1, 0.8)).toBe('above yield');
    expect(stressReading(1.6, 1.2)).toBe('above ultimate (est.)');
    expect(stressReading(1.6, undefined)).toBe('above yield');
  });
});
