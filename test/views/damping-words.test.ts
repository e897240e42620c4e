import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { dampingSentence, ringingWords } from '../../src/views/damping-words.ts';
import { ringingSentence } from '../../src/views/ringing.ts';
import { renderSummary } from '../../src/views/summary.ts';
import { withFinding } from '../../src/finding/investigation.ts';
import { sig } from '../../src/views/display-units.ts';

// One disc on a shaft with a flexible coupling in it (as in test/results/dynamic-damping.test.ts).
const text = (coupling: string, analysis: string) => `
case: { id: WORDS }
speed: 100 rpm
stop: { at: jam }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 500 mm, diameter: 40 mm, label: coupled run, coupling: ${coupling} }
stations:
  - { name: jam, at: 0 mm }
  - { name: disc, at: 500 mm, parts: [{ shape: inertia, inertia: 2 kg*m^2 }] }
analysis: { shaft_inertia: false, ${analysis} }
`;

describe('the damping in words, from the results', () => {
  const damped = analyseCase(parseCase(text('{ stiffness: 20 kN*m/rad, rated_torque: 1 kN*m, damping_ratio: 4 % }', 'damping_ratio: 0.5 %')));
  const plain = analyseCase(parseCase(text('{ stiffness: 20 kN*m/rad, rated_torque: 1 kN*m }', 'damping_ratio: 0.5 %')));

  it('names the damper that dominated first, with its share of the energy dissipated, as the results hold it', () => {
    const [first, second] = damped.dynamic.damping.dampers;
    expect(dampingSentence(damped)).toBe(
      `Damping: the coupling in "coupled run" (4 % of critical) took ${sig(100 * first.share, 2)} % of the ${sig(damped.dynamic.damping.total)} J the model's damping dissipated over the window; the shaft's material damping (0.5 %) ${sig(100 * second.share, 2)} %.`,
    );
  });

  it('where the coupling damps, the response rings down; with 0.5 % alone it still rings and says the ringing is the model’s', () => {
    expect(damped.dynamic.damping.ringing?.ringsOn).toBe(false);
    expect(ringingWords(damped)).toMatch(/^Rings down within the window: the torque in "coupled run": its last cycle swings ±[\d.]+ N·m, [\d.]+ % of the first after the peak/);
    expect(plain.dynamic.damping.ringing?.ringsOn).toBe(true);
    expect(ringingWords(plain)).toMatch(/^Still ringing at about constant amplitude at the end of the [\d.]+ ms window: .* the ringing after the peak is the model's, not a prediction/);
  });

  it("a figure caption names each element's own damping where they differ, the one ratio where they do not", () => {
    const ringing = [{ name: 'disc', amplitude: '10 rpm' }];
    expect(ringingSentence(damped, ringing)).toMatch(
      /The model's only damping is stiffness-proportional, each element's own: the coupling in "coupled run" 4 %, the shaft's material damping 0\.5 % of critical;/,
    );
    expect(ringingSentence(plain, ringing)).toMatch(/The model's only damping is 0\.5 % of critical in each side's lowest mode/);
  });

  it('check prints both lines under the dynamic model', () => {
    const s = renderSummary(withFinding(damped));
    expect(s).toContain(`  ${dampingSentence(damped)}`);
    expect(s).toContain(`  ${ringingWords(damped)}`);
  });
});
