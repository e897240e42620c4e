import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from './problems.ts';

const base = readFileSync(new URL('../data/one-disc.yaml', import.meta.url), 'utf8');

describe("a segment's torque limiter or shear pin", () => {
  it('reads slip_torque and shear_torque in SI', () => {
    expect(parseCase(base.replace('      diameter: 50 mm', '      diameter: 50 mm\n      slip_torque: 1.5 kN*m')).shaft.segments[0].slipTorque).toBe(1500);
    expect(parseCase(base.replace('      diameter: 50 mm', '      diameter: 50 mm\n      shear_torque: 900 N*m')).shaft.segments[0].shearTorque).toBe(900);
  });

  it('refuses both on one segment', () => {
    const text = base.replace('      diameter: 50 mm', '      diameter: 50 mm\n      slip_torque: 1.5 kN*m\n      shear_torque: 900 N*m');
    expect(problems(text).join('\n')).toMatch(new RegExp(`:${lineOf(text, 'shear_torque')}:\\d+ shaft\\.segments\\[0\\]\\.shear_torque: give either slip_torque .* or shear_torque .*, not both`));
  });

  it('refuses a limiter in a segment with a loaded station inside it', () => {
    const text = base
      .replace('      diameter: 50 mm', '      diameter: 50 mm\n      slip_torque: 1.5 kN*m')
      .replace('  - name: flywheel\n    at: 800 mm', '  - name: hub\n    at: 400 mm\n    parts: [{ shape: inertia, inertia: 0.1 kg*m^2 }]\n  - name: flywheel\n    at: 800 mm');
    expect(problems(text).join('\n')).toMatch(
      new RegExp(`:${lineOf(text, 'slip_torque')}:\\d+ shaft\\.segments\\[0\\]\\.slip_torque: station "hub" with parts lies inside this segment, so it is unclear which side of the limiter`),
    );
  });
});
