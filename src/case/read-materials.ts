import { findMaterial, MATERIAL_LIBRARY } from '../materials/library.ts';
import { MATERIAL_FIELDS, type Material, type MaterialField } from '../materials/material.ts';
import type { CaseReader } from './case-reader.ts';
import { keysOf, MATERIAL_SHAPE, materialFieldKind } from './case-shape.ts';
import { didYouMean } from './did-you-mean.ts';
import { readCyclicProperties } from './read-cyclic-properties.ts';
import { ELONGATION_LIMIT, FRACTURE_STRAIN_LIMIT, MODULUS_LIMIT, REDUCTION_OF_AREA_LIMIT, type Limit } from './limits.ts';

/** Fields with limits of their own (the others keep their kind's). */
const FIELD_LIMITS: Partial<Record<MaterialField, Limit>> = {
  shear_modulus: MODULUS_LIMIT,
  elastic_modulus: MODULUS_LIMIT,
  elongation: ELONGATION_LIMIT,
  reduction_of_area: REDUCTION_OF_AREA_LIMIT,
  fracture_strain: FRACTURE_STRAIN_LIMIT,
};

const MATERIAL_KEYS = keysOf(MATERIAL_SHAPE);

/**
 * Case-local materials from `materials:`, keyed by name; they shadow library entries of the same
 * key. The record has no prototype: a material may be named `__proto__` or `constructor`.
 */
export function readCaseMaterials(r: CaseReader, defaultSource = 'given in the case file'): Record<string, Material> {
  const out: Record<string, Material> = Object.create(null);
  if (!r.map(['materials'], [...r.keys(['materials'])])) return out;
  for (const key of r.keys(['materials'])) {
    const path = ['materials', key];
    if (!r.map(path, MATERIAL_KEYS, { required: true })) continue;
    const m: Material = { key, name: r.string([...path, 'name']) ?? key, source: r.string([...path, 'source']) ?? defaultSource };
    for (const [field, prop] of Object.entries(MATERIAL_FIELDS) as [MaterialField, keyof Material][]) {
      if (field === 'poisson_ratio') continue;
      const q = r.quantity([...path, field], materialFieldKind(field), { positive: true, limit: FIELD_LIMITS[field] });
      if (q) (m as unknown as Record<string, number>)[prop] = q.value;
    }
    if (m.yieldStrength !== undefined && m.tensileStrength !== undefined && m.tensileStrength < m.yieldStrength) {
      r.fail(
        'E_MATERIAL',
        [...path, 'tensile_strength'],
        `is below the yield strength (${Number((m.yieldStrength / 1e6).toPrecision(4))} MPa); a tensile strength is at least the yield strength, such as "${Number(((m.yieldStrength * 1.2) / 1e6).toPrecision(3))} MPa"`,
      );
    }
    // A plain number: every isotropic solid has -1 < ν < 0.5; metals lie near 0.2–0.35.
    const nu = r.number([...path, 'poisson_ratio'], { example: "Poisson's ratio from the material's data sheet, from 0 to 0.5, such as 0.29", min: 0, max: 0.499 });
    if (nu !== undefined) m.poissonRatio = nu;
    const cyclic = readCyclicProperties(r, path);
    if (cyclic) m.cyclic = cyclic;
    const basis = r.string([...path, 'strength_basis'], { allowed: ['minimum', 'typical'] });
    if (basis) m.strengthBasis = basis as Material['strengthBasis'];
    out[key] = m;
  }
  return out;
}

/**
 * Resolves a material name used at `path` against the case's own materials, then the library;
 * checks it has every property its use needs. Reports and returns undefined when it cannot.
 */
export function resolveMaterial(
  r: CaseReader,
  path: (string | number)[],
  key: string,
  caseMaterials: Record<string, Material>,
  needs: readonly MaterialField[],
  used: Record<string, Material>,
): Material | undefined {
  const m = Object.hasOwn(caseMaterials, key) ? caseMaterials[key] : findMaterial(key);
  if (!m) {
    const known = [...Object.keys(caseMaterials), ...MATERIAL_LIBRARY.map((x) => x.key)];
    const guess = didYouMean(key, known);
    r.fail(
      'E_REFERENCE',
      path,
      `unknown material "${key}"; ${guess ? `did you mean "${guess}"? ` : ''}give a key from \`shaftcase materials\` (such as "aisi-1045-cd") or one defined under materials:`,
    );
    return undefined;
  }
  const missing = needs.filter((f) => m[MATERIAL_FIELDS[f]] === undefined);
  if (missing.length > 0) {
    r.fail('E_MATERIAL', path, `material "${key}" has no ${missing.join(' or ')}, which this use needs; add it under materials.${key}, e.g. ${missing.map(exampleOf).join(', ')}`);
    return undefined;
  }
  used[key] = m;
  return m;
}

function exampleOf(field: MaterialField): string {
  const examples: Record<MaterialField, string> = {
    shear_modulus: 'shear_modulus: "79.3 GPa"',
    elastic_modulus: 'elastic_modulus: "207 GPa"',
    poisson_ratio: 'poisson_ratio: 0.29',
    density: 'density: "7850 kg/m^3"',
    yield_strength: 'yield_strength: "530 MPa"',
    tensile_strength: 'tensile_strength: "630 MPa"',
    elongation: 'elongation: "12 %"',
    reduction_of_area: 'reduction_of_area: "35 %"',
    fracture_strain: 'fracture_strain: 0.75',
  };
  return examples[field];
}
