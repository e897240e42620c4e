import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { show, sig } from '../../src/views/display-units.ts';
import { dynamicLines, renderSummary, verdictSentence } from '../../src/views/summary.ts';

const sample = (f: string) => analyseCase(parseCase(readFileSync(new URL(`../../sample-cases/${f}`, import.meta.url), 'utf8')));

describe('the summary with the dynamic model', () => {
  it('shows each side\'s dynamic peak beside the energy method\'s, the lowest frequencies, and what slipped', () => {
    const r = sample('granulator-tramp-metal.yaml');
    const lines = dynamicLines(r).join('\n');
    const s = r.dynamic.sides[0];
    // Past yield the peak is capped; the torque the elastic check stands on is named beside it.
    const elastic = Math.max(...r.dynamic.pieces.map((p) => p.elasticPeakTorque));
    expect(elastic).toBeGreaterThan(s.dynamicPeakTorque);
    expect(lines).toContain(`peak torque ${show(s.dynamicPeakTorque, 'torque', 'metric')}, ${show(elastic, 'torque', 'metric')} had it stayed elastic (energy method ${show(s.energyPeakTorque, 'torque', 'metric')}), elastic yield ratio ${sig(s.dynamicYieldRatio)}`);
    expect(lines).toContain(`${sig(r.dynamic.naturalFrequencies[0])}`);
    expect(lines).toMatch(/the belt at "drive sheave" \(slip torque 1870 N·m\) slipped .* still slipping at the end/);
  });

  it('names the verdict\'s basis and gives the reason under it', () => {
    const r = sample('granulator-tramp-metal.yaml');
    const text = renderSummary(r);
    expect(text).toMatch(/Verdict \(dynamic model\): YIELDED/);
    expect(text).toContain(`  ${r.verdictReason}`);
    expect(renderSummary(sample('edger-arbor-two-sides.yaml'))).toMatch(/Verdict \(elastic energy method\): .*\n {2}The verdict uses the energy method/);
  });

  it('shows US units in a US case', () => {
    expect(dynamicLines(sample('screw-conveyor-jam-us.yaml')).join('\n')).toMatch(/peak torque [\d.]+ lbf·ft(, [\d.]+ lbf·ft had it stayed elastic)? \(energy method [\d.]+ lbf·ft\)/);
  });
});

describe('the elastic verdict in words for a brittle shaft', () => {
  it('says a gray-iron shaft over its strength cracks rather than twists, not that it yielded', () => {
    const text = `case: { id: B }
speed: 600 rpm
stop: { at: jam }
shaft:
  material: gray-iron-30
  segments:
    - { length: 500 mm, diameter: 40 mm }
stations:
  - { name: disc, at: 0 mm, parts: [{ shape: inertia, inertia: 1 kg*m^2 }] }
  - { name: jam, at: 500 mm }
`;
    const r = analyseCase(parseCase(text));
    expect(r.yieldRatio).toBeGreaterThan(1);
    expect(verdictSentence(r)).toMatch(/^OVER ITS STRENGTH: .* brittle material .* cracks or breaks rather than taking a permanent twist\.$/);
    expect(verdictSentence(r)).not.toMatch(/YIELDED/);
  });
});
