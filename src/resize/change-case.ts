import type { Case, Segment } from '../case/case.ts';
import type { Material } from '../materials/material.ts';

/**
 * A copy of the case with new outer diameters for some segments (by index into
 * `shaft.segments`), each segment's bore scaled with it so its bore ratio is kept. The parts and
 * their hubs are left as they are. The input is not changed.
 */
export function withDiameters(c: Case, diameters: ReadonlyMap<number, number>): Case {
  const segments = c.shaft.segments.map((s): Segment => {
    const d = diameters.get(s.index);
    return d === undefined ? s : { ...s, diameter: d, bore: (s.bore * d) / s.diameter };
  });
  return { ...c, shaft: { segments } };
}

/** A copy of the case with every shaft segment made of `material`. The input is not changed. */
export function withShaftMaterial(c: Case, material: Material): Case {
  return {
    ...c,
    materials: { ...c.materials, [material.key]: material },
    shaft: { segments: c.shaft.segments.map((s) => ({ ...s, material: material.key })) },
  };
}
