import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../../src/case/parse-case.ts';
import { renderDynamicsSection } from '../../../src/report/sections/dynamics.ts';
import { analyseCase } from '../../../src/results/analyse-case.ts';
import { show, sig } from '../../../src/views/display-units.ts';

const sample = (f: string) => analyseCase(parseCase(readFileSync(new URL(`../../../sample-cases/${f}`, import.meta.url), 'utf8')));

describe('renderDynamicsSection', () => {
  const r = sample('roll-line-limiter-two-sides.yaml');
  const md = renderDynamicsSection(r);

  it('compares energy method and dynamic model per side, with numbers from Results', () => {
    expect(md).toMatch(/^The shaft is modelled as a chain of/);
    for (const s of r.dynamic.sides) {
      expect(md).toContain(
        `| ${s.side} | ${r.sides.find((x) => x.side === s.side)!.stations.join(', ')} | ${show(s.energyPeakTorque, 'torque', 'metric')} | ${show(s.dynamicPeakTorque, 'torque', 'metric')} | ${sig(s.energyYieldRatio)} | ${sig(s.dynamicYieldRatio)} |`,
      );
    }
    expect(md).toContain(r.verdictReason);
  });

  it('tabulates the natural frequencies and says what a vibration reading after repair might show', () => {
    expect(md).toContain('### Natural frequencies, stop held');
    expect(md).toContain(`| 1 | ${r.dynamic.frequencies[0].side} | ${sig(r.dynamic.naturalFrequencies[0])} Hz |`);
    expect(md).toMatch(/What a vibration reading after repair might show: .* sits near [\d.]+ Hz on side A and [\d.]+ Hz on side B/);
  });

  it('shows what slipped and that the limiter kept its side of the shaft protected', () => {
    expect(md).toMatch(/\| the torque limiter in "limiter hub seat" \| 9000 N·m \| [\d.]+ ms \|/);
    expect(md).toMatch(/The limiter slipped; the highest stress \/ shear yield anywhere on the shaft is/);
    expect(md).toMatch(/### Events, located in time\n\n- [\d.]+ ms: The belt at "drive pulley" starts to slip\./);
  });

  it("shows a belt's capstan working where it came from belt data", () => {
    expect(renderDynamicsSection(sample('granulator-tramp-metal.yaml'))).toMatch(
      /The belt at "drive sheave", by the capstan relation F1\/F2 = e\^\(μ_eff·φ\) .*μ = 0\.15, wrap φ = 153°; V-groove of 34°, so μ_eff = μ\/sin\(β\/2\) = 0\.513; F1\/F2 = 3\.9\d; .* slip torque is \(F1 − F2\)·r = 1870 N·m at the 450 mm pulley/,
    );
  });

  it("states the model's assumptions, with the damping default and why", () => {
    expect(md).toMatch(/### Assumptions of the dynamic model/);
    expect(md).toMatch(/Damping is stiffness-proportional, 0\.50 % of critical .* \(the default, a small value typical of steel shafting/);
    expect(md).toMatch(/The energy books close to/);
  });
});
