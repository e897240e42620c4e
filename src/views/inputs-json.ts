import type { Case, Part } from '../case/case.ts';
import type { Material } from '../materials/material.ts';

/** Unit suffixes of a part's `dimensions` keys (SI). */
const DIMENSION_UNITS: Record<string, string> = {
  diameter: 'm',
  thickness: 'm',
  bore: 'm',
  radius_of_gyration: 'm',
  density: 'kg_m3',
  mass: 'kg',
  inertia: 'kg_m2',
};

/** The checked case as JSON: SI, units in the key names, as the engine used it. */
export function inputsToJson(c: Case): Record<string, unknown> {
  return {
    case: { ...c.meta },
    units: c.units,
    speed_rad_s: c.speed,
    stop: { at: c.stop.at, duration_s: c.stop.duration },
    analysis: { criterion: c.analysis.criterion },
    materials: Object.fromEntries(Object.entries(c.materials).map(([k, m]) => [k, materialJson(m)])),
    shaft: {
      segments: c.shaft.segments.map((s) => ({
        segment: s.index,
        label: s.label ?? null,
        from_m: s.start,
        to_m: s.end,
        diameter_m: s.diameter,
        bore_m: s.bore,
        material: s.material,
        kt: s.kt,
      })),
    },
    stations: c.stations.map((s) => ({ name: s.name, at_m: s.at, parts: s.parts.map(partJson) })),
    observed: {
      permanent_twist: c.observed.permanentTwist.map((t) => ({ between: t.between, angle_rad: t.angle, method: t.method ?? null })),
      fracture: c.observed.fracture
        ? {
            type: c.observed.fracture.type,
            ...(typeof c.observed.fracture.at === 'number' ? { at_m: c.observed.fracture.at } : { at: c.observed.fracture.at ?? null }),
            notes: c.observed.fracture.notes ?? null,
          }
        : null,
      key: c.observed.key ?? null,
      hub: c.observed.hub ?? null,
      other: c.observed.other ?? null,
      notes: c.observed.notes ?? null,
      photos: c.observed.photos.map((p) => ({ path: p.path, caption: p.caption ?? null })),
    },
    tolerances: Object.fromEntries(Object.entries(c.tolerances).map(([path, t]) => [path, t.kind === 'relative' ? { relative: t.fraction } : { absolute_SI: t.value }])),
  };
}

function partJson(p: Part): Record<string, unknown> {
  return {
    name: p.name,
    shape: p.shape,
    count: p.count,
    speed_ratio: p.speedRatio,
    inertia_kg_m2: p.inertia,
    material: p.material ?? null,
    dimensions: Object.fromEntries(Object.entries(p.dimensions).map(([k, v]) => [DIMENSION_UNITS[k] ? `${k}_${DIMENSION_UNITS[k]}` : k, v])),
  };
}

function materialJson(m: Material): Record<string, unknown> {
  return {
    name: m.name,
    shear_modulus_Pa: m.shearModulus ?? null,
    elastic_modulus_Pa: m.elasticModulus ?? null,
    poisson_ratio: m.poissonRatio ?? null,
    density_kg_m3: m.density ?? null,
    yield_strength_Pa: m.yieldStrength ?? null,
    tensile_strength_Pa: m.tensileStrength ?? null,
    elongation: m.elongation ?? null,
    reduction_of_area: m.reductionOfArea ?? null,
    strength_basis: m.strengthBasis ?? null,
    source: m.source,
  };
}
