import { parseCase } from '../../src/case/parse-case.ts';
import type { Case } from '../../src/case/case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';

/** A shaft layout for tests: the case text is built from it, so every check runs through parseCase. */
export interface Layout {
  rpm: number;
  /** Segments from the shaft's start: [length mm, diameter mm, bore mm, kt]. */
  segments: [number, number, number, number?][];
  /** Stations: [name, at mm, inertia kg·m² (0 = no parts), extra YAML lines for the station]. */
  stations: [string, number, number, string?][];
  stop: string;
  material?: string;
  /** YAML lines under analysis:. */
  analysis?: string;
  /** A materials: section, as YAML text. */
  materials?: string;
  units?: 'metric' | 'us';
}

export function caseText(l: Layout): string {
  const seg = l.segments.map(([len, d, b, kt]) => `    - { length: ${len} mm, diameter: ${d} mm${b > 0 ? `, bore: ${b} mm` : ''}${kt !== undefined ? `, kt: ${kt}` : ''} }`).join('\n');
  const st = l.stations
    .map(([n, at, j, extra]) => `  - name: ${n}\n    at: ${at} mm\n${extra ? `${extra}\n` : ''}${j > 0 ? `    parts:\n      - { shape: inertia, inertia: ${j} kg*m^2 }\n` : ''}`)
    .join('');
  return [
    'case: { id: P }',
    `units: ${l.units ?? 'metric'}`,
    `speed: ${l.rpm} rpm`,
    `stop: { at: ${l.stop} }`,
    l.materials ?? '',
    'shaft:',
    `  material: ${l.material ?? 'aisi-1045-cd'}`,
    '  segments:',
    seg,
    'stations:',
    st,
    l.analysis ? `analysis:\n${l.analysis}` : '',
  ].join('\n');
}

export const caseOf = (l: Layout): Case => parseCase(caseText(l));
export const run = (l: Layout) => {
  const c = caseOf(l);
  return { c, r: analyseCase(c) };
};

/** |a/b − 1|: relative difference, for exact-to-rounding checks. */
export const rel = (a: number, b: number) => Math.abs(a / b - 1);
