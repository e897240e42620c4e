import type { Material } from '../materials/material.ts';
import type { CaseReader } from './case-reader.ts';
import type { Segment } from './case.ts';
import { resolveMaterial } from './read-materials.ts';

const SEGMENT_KEYS = ['length', 'diameter', 'bore', 'material', 'kt', 'label'];

/** The shaft's segments in order from its start, with positions accumulated. */
export function readShaft(
  r: CaseReader,
  caseMaterials: Record<string, Material>,
  used: Record<string, Material>,
): { segments: Segment[]; length: number } {
  const segments: Segment[] = [];
  if (!r.map(['shaft'], ['material', 'segments'], { required: true, example: 'a mapping with material and segments' })) return { segments, length: 0 };
  const shaftMaterial = r.string(['shaft', 'material']);
  const n = r.list(['shaft', 'segments'], { required: true, example: 'a list of segments, each with length and diameter' });
  let position = 0;
  for (let i = 0; i < n; i++) {
    const path = ['shaft', 'segments', i];
    if (!r.map(path, SEGMENT_KEYS, { required: true })) continue;
    const length = r.quantity([...path, 'length'], 'length', { required: true, positive: true });
    const diameter = r.quantity([...path, 'diameter'], 'length', { required: true, positive: true });
    const bore = r.quantity([...path, 'bore'], 'length', { nonNegative: true });
    const kt = r.number([...path, 'kt'], { example: 'a factor of 1 or more, such as 1.6', min: 1 }) ?? 1;
    const label = r.string([...path, 'label']);
    const materialKey = r.string([...path, 'material']) ?? shaftMaterial;
    if (diameter && bore && bore.value >= diameter.value) {
      r.fail('E_RANGE', [...path, 'bore'], `the bore must be smaller than the diameter (${fmtMm(diameter.value)}); give a bore such as "${fmtMm(diameter.value * 0.5)}", or leave it out for a solid segment`);
    }
    let material: Material | undefined;
    if (materialKey === undefined) {
      r.fail('E_MISSING', [...path, 'material'], 'no material: give shaft.material (for all segments) or this segment\'s material, such as "aisi-1045-cd"');
    } else {
      const where = r.has([...path, 'material']) ? [...path, 'material'] : ['shaft', 'material'];
      material = resolveMaterial(r, where, materialKey, caseMaterials, ['shear_modulus', 'yield_strength'], used);
    }
    if (!length || !diameter || !material) {
      if (length) position += length.value;
      continue;
    }
    segments.push({
      index: i,
      label,
      start: position,
      end: position + length.value,
      diameter: diameter.value,
      bore: bore?.value ?? 0,
      material: material.key,
      kt,
    });
    position += length.value;
  }
  return { segments, length: position };
}

function fmtMm(m: number): string {
  return `${Number((m * 1000).toPrecision(3))} mm`;
}
