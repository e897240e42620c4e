import { parseCase } from '../../src/case/parse-case.ts';
import type { Case } from '../../src/case/case.ts';

/**
 * A case built on EP5 of shared REFERENCE.md (a test check, not demo data): the 400 mm × 50 mm
 * steel disc (J = 0.986460 kg·m²) on a 40 mm × 500 mm shaft stopped dead at its far end.
 * Options swap the speed, the material lines, the shaft segments and add `observed:` text.
 */
export function ep5CaseText(o: { speed?: string; material?: string[]; segments?: string[]; stations?: string[]; observed?: string[]; analysis?: string[] } = {}): string {
  return [
    'case: { id: EP5-TEST }',
    `speed: ${o.speed ?? '300 rpm'}`,
    'stop: { at: seized bearing }',
    'materials:',
    '  ep5-steel:',
    ...(o.material ?? ['shear_modulus: 79.3 GPa', 'yield_strength: 530 MPa', 'tensile_strength: 630 MPa', 'elongation: 12 %', 'reduction_of_area: 35 %', 'density: 7850 kg/m^3']).map(
      (l) => `    ${l}`,
    ),
    'shaft:',
    '  material: ep5-steel',
    '  segments:',
    ...(o.segments ?? ['- { length: 500 mm, diameter: 40 mm }']).map((l) => `    ${l}`),
    'stations:',
    '  - { name: seized bearing, at: 0 mm }',
    '  - name: disc',
    '    at: 500 mm',
    '    parts:',
    '      - { shape: disc, diameter: 400 mm, thickness: 50 mm, density: 7850 kg/m^3 }',
    ...(o.stations ?? []).map((l) => `  ${l}`),
    ...(o.analysis ? ['analysis:', ...o.analysis.map((l) => `  ${l}`)] : []),
    ...(o.observed ? ['observed:', ...o.observed.map((l) => `  ${l}`)] : []),
    '',
  ].join('\n');
}

export function ep5Case(o: Parameters<typeof ep5CaseText>[0] = {}): Case {
  return parseCase(ep5CaseText(o), 'ep5.yaml');
}
