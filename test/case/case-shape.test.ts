// The case's description (src/case/case-shape.ts) and the readers agree: every field a reader reads
// on the sample cases, the templates and a few snippets that reach every key has the type and the
// unit kind the description gives it, every mapping is read with the description's keys, and every
// key of the description is read by some reader. So the JSON Schema made from the description
// says what the reader accepts.
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { FieldRead, Path } from '../../src/case/case-reader.ts';
import { CASE_SHAPE, keysOf, shapeAt, type Shape } from '../../src/case/case-shape.ts';
import { parseCase } from '../../src/case/parse-case.ts';

const SAMPLES = new URL('../../sample-cases/', import.meta.url);
const TEMPLATES = new URL('../../templates/', import.meta.url);

/** Snippets that, with the sample cases, reach the keys no sample case has (read even where a snippet is refused). */
const SNIPPETS = [
  `case: { id: S-1, title: t, occurred: 2026-01-02, machine: m, asset: A-1, site: s, ticket: k, investigator: i, notes: n }
units: metric
speed: 1000 rpm
stop: { at: a, duration: 10 ms, torque_capacity: 900 N*m }
materials:
  own: { name: x, shear_modulus: 80 GPa, elastic_modulus: 205 GPa, density: 7850 kg/m^3, yield_strength: 500 MPa, tensile_strength: 600 MPa, elongation: 12 %, reduction_of_area: 40 %, fracture_strain: 1.1, poisson_ratio: 0.29, cyclic_strength_coefficient: 1258 MPa, cyclic_hardening_exponent: 0.208, fatigue_strength_coefficient: 1227 MPa, fatigue_strength_exponent: -0.095, fatigue_ductility_coefficient: 1.0, fatigue_ductility_exponent: -0.66, strength_basis: minimum, source: cert }
shaft:
  material: own
  segments:
    - { length: 100 mm, diameter: 40 mm, bore: 10 mm, material: own, kt: 1.5, label: seat, slip_torque: 900 N*m }
    - { length: 100 mm, diameter: 40 mm, shear_torque: 900 N*m }
stations:
  - { name: a, at: 0 mm, key: { width: 12 mm, height: 8 mm, length: 50 mm, material: own, hub_depth: 3 mm } }
  - name: b
    at: 200 mm
    parts:
      - { shape: disc, name: d, count: 1, speed_ratio: 1, rated_speed: 3000 rpm, diameter: 300 mm, thickness: 40 mm, bore: 40 mm, material: own }
      - { shape: disc, diameter: 300 mm, thickness: 40 mm, density: 7850 kg/m^3 }
      - { shape: inertia, inertia: 1 kg*m^2 }
      - { shape: mass, mass: 10 kg, radius_of_gyration: 100 mm }
      - { shape: inertia, inertia: 1 kg*m^2, speed_ratio: 3 }
    drive: { speed_ratio: 3, power: 10 kW, running_torque: 30 N*m, curve: [{ speed: 0 rpm, torque: 90 N*m }, { speed: 3000 rpm, torque: 0 N*m }], belt: { slip_torque: 500 N*m } }
analysis: { criterion: max-shear, hardening: linear, elements: 20, shaft_inertia: true, dynamic_plasticity: true, damping_ratio: 2 %, duration: 50 ms, samples: 200, dynamic_samples: 0, seed: 3, strength_scatter: 5 %, design_factor: 1.5, service_factor: 1.5, max_scale: 1.3, limiter_at: b }
observed:
  permanent_twist: [{ between: [a, b], angle: 1 deg, method: m }]
  fracture: { type: helical, at: 100 mm, notes: n }
  key: k
  hub: h
  other: o
  notes: n
  photos: [{ path: photos/a.jpg, caption: c }]
`,
  `case: { id: S-2 }
speed: 1000 rpm
stop: { at: a }
shaft: { material: aisi-1045-cd, segments: [{ length: 100 mm, diameter: 40 mm }] }
stations:
  - { name: a, at: 0 mm }
  - name: b
    at: 100 mm
    parts: [{ shape: inertia, inertia: 1 kg*m^2 }]
    drive: { rotor_inertia: 0.1 kg*m^2, speed_ratio: 2, torque: 50 N*m, belt: { wrap_angle: 160 deg, friction: 0.3, groove_angle: 38 deg, tight_side_tension: 4000 N, pulley_diameter: 300 mm } }
`,
];

function corpus(): { name: string; text: string }[] {
  const files = [
    ...readdirSync(SAMPLES)
      .filter((f) => f.endsWith('.yaml'))
      .map((f) => ({ name: f, text: readFileSync(new URL(f, SAMPLES), 'utf8') })),
    ...readdirSync(TEMPLATES)
      .filter((f) => f.endsWith('.yaml'))
      .map((f) => ({ name: f, text: readFileSync(new URL(f, TEMPLATES), 'utf8') })),
  ];
  return [...files, ...SNIPPETS.map((text, i) => ({ name: `snippet ${i + 1}`, text }))];
}

/** The reads of every corpus file, whether or not the file is refused. */
function reads(): { file: string; path: Path; read: FieldRead }[] {
  const out: { file: string; path: Path; read: FieldRead }[] = [];
  for (const { name, text } of corpus()) {
    try {
      parseCase(text, name, undefined, (path, read) => out.push({ file: name, path: [...path], read }));
    } catch {
      // refused cases are read all the same: the readers collect every problem
    }
  }
  return out;
}

/** A path with list places and user names replaced: `stations[].drive.torque`, `materials.*.density`. */
function schematic(path: Path): string {
  let s: Shape | undefined = CASE_SHAPE;
  const parts: string[] = [];
  for (const step of path) {
    parts.push(s?.type === 'named' ? '*' : typeof step === 'number' ? '[]' : String(step));
    s = s && shapeAt([step], s);
  }
  return parts.join('.').replace(/\.\[\]/g, '[]');
}

function allKeys(s: Shape, prefix: string, out: string[]): string[] {
  if (s.type === 'mapping')
    for (const [k, f] of Object.entries(s.keys)) {
      const p = prefix ? `${prefix}.${k}` : k;
      out.push(p);
      allKeys(f.shape, p, out);
    }
  if (s.type === 'named') allKeys(s.of, `${prefix}.*`, out);
  if (s.type === 'list') allKeys(s.of, `${prefix}[]`, out);
  return out;
}

describe('the case description and the readers', () => {
  const all = reads();

  it("every field read has the description's type and unit kind, and every mapping is read with its keys", () => {
    const wrong: string[] = [];
    for (const { file, path, read } of all) {
      const shape = shapeAt(path);
      const where = `${file}: ${schematic(path) || '(top)'}`;
      if (!shape) {
        wrong.push(`${where}: not in the description`);
        continue;
      }
      if (read.type === 'mapping') {
        if (shape.type === 'named') continue;
        if (shape.type !== 'mapping') wrong.push(`${where}: read as a mapping, described as ${shape.type}`);
        else {
          const variants = [undefined, 'disc', 'inertia', 'mass'].map((v) => keysOf(shape, v).join(','));
          if (!variants.includes(read.keys.join(','))) wrong.push(`${where}: read with keys ${read.keys.join(', ')}, described with ${keysOf(shape).join(', ')}`);
        }
      } else if (read.type === 'quantity') {
        const ok = (shape.type === 'quantity' && shape.kind === read.kind) || (shape.type === 'text' && shape.or === read.kind);
        if (!ok) wrong.push(`${where}: read as a quantity of ${read.kind}, described as ${shape.type}${shape.type === 'quantity' ? ` of ${shape.kind}` : ''}`);
      } else if (read.type === 'text') {
        if (shape.type !== 'text') wrong.push(`${where}: read as text, described as ${shape.type}`);
        else if (read.allowed && read.allowed.join(',') !== (shape.allowed ?? []).join(',')) wrong.push(`${where}: allowed ${read.allowed.join(', ')}, described ${shape.allowed?.join(', ')}`);
      } else if (shape.type !== read.type) wrong.push(`${where}: read as ${read.type}, described as ${shape.type}`);
    }
    expect([...new Set(wrong)]).toEqual([]);
  });

  it('every key of the description is read by a reader', () => {
    const read = new Set(all.map((r) => schematic(r.path)));
    expect(allKeys(CASE_SHAPE, '', []).filter((k) => !read.has(k))).toEqual([]);
  });

  it("keysOf gives a part's keys by its shape, and shapeAt walks lists and named mappings", () => {
    expect(keysOf(shapeAt(['stations', 0, 'parts', 0])!, 'mass')).toEqual(['shape', 'name', 'count', 'speed_ratio', 'rated_speed', 'mass', 'radius_of_gyration']);
    expect(shapeAt(['materials', 'my-steel', 'yield_strength'])).toMatchObject({ type: 'quantity', kind: 'stress' });
    expect(shapeAt(['stations', 'x'])).toBeUndefined();
    expect(shapeAt(['shaft', 'segments', 0, 'nonsense'])).toBeUndefined();
  });
});
