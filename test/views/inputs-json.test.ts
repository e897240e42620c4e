import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { inputsToJson } from '../../src/views/inputs-json.ts';

const CASE = `
case: { id: T-1, title: test }
speed: 600 rpm ± 2 %
stop: { at: stop }
shaft:
  material: aisi-1045-cd
  segments:
    - { length: 1 in, diameter: 40 mm, bore: 10 mm, kt: 1.5, label: seat }
stations:
  - { name: stop, at: 0 mm }
  - name: wheel
    at: 1 in
    parts:
      - { shape: disc, name: wheel, diameter: 200 mm, thickness: 20 mm, density: 7850 kg/m^3, count: 2 }
observed:
  permanent_twist:
    - { between: [stop, wheel], angle: 90 deg }
  fracture: { type: helical, at: 10 mm }
`;

describe('inputsToJson', () => {
  it('inputsToJson gives the case as parsed, SI, with units in the key names', () => {
    const j = inputsToJson(parseCase(CASE)) as Record<string, any>;
    expect(j.speed_rad_s).toBeCloseTo((600 * 2 * Math.PI) / 60, 12); // rpm to rad/s: 2π/60 (definition of the revolution)
    expect(j.shaft.segments[0]).toEqual({ segment: 0, label: 'seat', from_m: 0, to_m: 0.0254, diameter_m: 0.04, bore_m: 0.01, material: 'aisi-1045-cd', kt: 1.5 });
    expect(j.stations[1].parts[0].dimensions).toEqual({ diameter_m: 0.2, thickness_m: 0.02, bore_m: 0, density_kg_m3: 7850 });
    expect(j.stations[1].parts[0].count).toBe(2);
    expect(j.observed.permanent_twist[0].angle_rad).toBeCloseTo(Math.PI / 2, 12);
    expect(j.observed.fracture).toEqual({ type: 'helical', at_m: 0.01, notes: null });
    expect(j.tolerances).toEqual({ speed: { relative: 0.02 } });
    expect(j.materials['aisi-1045-cd'].yield_strength_Pa).toBe(530e6);
  });
});
