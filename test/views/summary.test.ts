import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { withFinding } from '../../src/finding/investigation.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { show, sig } from '../../src/views/display-units.ts';
import { findingSentence } from '../../src/views/finding-words.ts';
import { dynamicLines, renderSummary } from '../../src/views/summary.ts';

const sample = (f: string) => withFinding(analyseCase(parseCase(readFileSync(new URL(`../../sample-cases/${f}`, import.meta.url), 'utf8'))));

describe('the summary with the dynamic model', () => {
  it("shows each side's peak as carried, and like for like its elastic peak and ratio; the lowest frequencies; what slipped", () => {
    const r = sample('granulator-tramp-metal.yaml');
    const lines = dynamicLines(r, "the finding's model").join('\n');
    const s = r.dynamic.sides[0];
    const elastic = Math.max(...r.dynamic.pieces.map((p) => p.elasticPeakTorque));
    expect(elastic).toBeGreaterThan(s.dynamicPeakTorque);
    // The largest torque as carried is not the governing piece's: that one is capped at its fully
    // plastic torque, (2π/3)·τ_Y·c³ (Beer & Johnston, Mechanics of Materials, Sec. 3.9; from memory,
    // confident), while a stouter piece beyond it carries more. The line says where.
    const top = r.dynamic.pieces.reduce((a, b) => (b.peakTorque > a.peakTorque ? b : a));
    const governing = r.dynamic.pieces[r.dynamic.governing];
    expect(top.piece.segment.label).not.toBe(governing.piece.segment.label);
    expect(governing.peakTorque).toBeLessThan(top.peakTorque);
    expect(lines).toContain(
      `peak torque as carried ${show(s.dynamicPeakTorque, 'torque', 'metric')} in "${top.piece.segment.label}" (past yield a piece carries at most its fully plastic torque); elastic ${show(elastic, 'torque', 'metric')}, stress / shear yield ${sig(s.dynamicYieldRatio)}`,
    );
    expect(lines).not.toContain('energy method');
    expect(lines).toContain(`${sig(r.dynamic.naturalFrequencies[0])}`);
    expect(lines).toMatch(/the belt at "drive sheave" \(slip torque 1870 N·m\) slipped .* still slipping at the end/);
  });

  it("opens with the one finding line and its model's reason, and heads the other model as a comparison", () => {
    const r = sample('granulator-tramp-metal.yaml');
    const text = renderSummary(r);
    const lines = text.split('\n');
    expect(lines[3]).toBe(`Finding: ${findingSentence(r.finding, 'metric')}`);
    expect(lines[4]).toBe(`  Why this model: ${r.verdictReason}`);
    expect(text).not.toMatch(/Verdict/);
    expect(text.indexOf("Dynamic model (the finding's model")).toBeLessThan(text.indexOf('For comparison, the energy method'));
    const edger = renderSummary(sample('edger-arbor-two-sides.yaml'));
    expect(edger.indexOf("Energy method (the finding's model")).toBeLessThan(edger.indexOf('Dynamic model (for comparison'));
  });

  it("compares the models like for like: the dynamic model's elastic peak against the energy method's", () => {
    const r = sample('edger-arbor-two-sides.yaml');
    const text = renderSummary(r);
    const worst = Math.max(...r.dynamic.sides.map((s) => Math.abs(Math.max(...r.dynamic.pieces.filter((p) => p.side === s.side).map((p) => p.elasticPeakTorque)) / s.energyPeakTorque - 1)));
    expect(text).toContain(`like for like (both elastic), its peak torques are within ${sig(100 * worst, 2)} %`);
    expect(worst).toBeLessThan(0.1);
  });

  it('shows US units in a US case', () => {
    expect(dynamicLines(sample('screw-conveyor-jam-us.yaml'), 'x').join('\n')).toMatch(/peak torque [\d.]+ lbf·ft \(elastic\), stress \/ shear yield [\d.]+/);
  });

  it('does not list a piece whose permanent twist is below what an instrument resolves', () => {
    const text = renderSummary(sample('roll-line-limiter-two-sides.yaml'));
    expect(text).not.toMatch(/e-\d/);
  });
});
