import type { Material } from '../materials/material.ts';
import type { CaseReader } from './case-reader.ts';
import type { Segment, Station } from './case.ts';
import { keysOf, SEGMENT_SHAPE, SHAFT_SHAPE } from './case-shape.ts';
import { NUMBER_LIMITS, SIZE_LIMITS } from './limits.ts';
import { resolveMaterial } from './read-materials.ts';

const SEGMENT_KEYS = keysOf(SEGMENT_SHAPE);

/** The shaft's segments in order from its start, with positions accumulated. */
export function readShaft(
  r: CaseReader,
  caseMaterials: Record<string, Material>,
  used: Record<string, Material>,
): { segments: Segment[]; length: number } {
  const segments: Segment[] = [];
  if (!r.map(['shaft'], keysOf(SHAFT_SHAPE), { required: true, example: 'a mapping with material and segments' })) return { segments, length: 0 };
  const shaftMaterial = r.string(['shaft', 'material']);
  const n = r.list(['shaft', 'segments'], { required: true, example: 'a list of segments, each with length and diameter', max: SIZE_LIMITS.segments, what: 'segments' });
  let position = 0;
  for (let i = 0; i < n; i++) {
    const path = ['shaft', 'segments', i];
    if (!r.map(path, SEGMENT_KEYS, { required: true })) continue;
    const length = r.quantity([...path, 'length'], 'length', { required: true, positive: true });
    const diameter = r.quantity([...path, 'diameter'], 'length', { required: true, positive: true });
    const bore = r.quantity([...path, 'bore'], 'length', { nonNegative: true });
    const kt = r.number([...path, 'kt'], { example: 'a factor from 1 to 10, such as 1.6', min: NUMBER_LIMITS.kt[0], max: NUMBER_LIMITS.kt[1] }) ?? 1;
    const label = r.string([...path, 'label']);
    const protection = readProtection(r, path);
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
      ...protection,
    });
    position += length.value;
  }
  return { segments, length: position };
}

/** A segment's `slip_torque` (friction torque limiter, slip coupling) or `shear_torque` (shear pin), not both. */
function readProtection(r: CaseReader, path: (string | number)[]): Pick<Segment, 'slipTorque' | 'shearTorque'> {
  const slip = r.quantity([...path, 'slip_torque'], 'torque', { positive: true, example: 'the torque limiter\'s slip setting, such as "1500 N*m"' });
  const shear = r.quantity([...path, 'shear_torque'], 'torque', { positive: true, example: 'the torque at which the shear pin parts, such as "2200 N*m"' });
  if (slip && shear) {
    r.fail('E_RANGE', [...path, 'shear_torque'], 'give either slip_torque (a limiter that slips) or shear_torque (a pin that parts) on one segment, not both; split the segment if it has both');
    return {};
  }
  return slip ? { slipTorque: slip.value } : shear ? { shearTorque: shear.value } : {};
}

/**
 * A limiter or shear pin sits somewhere in its segment; a station with parts inside that segment
 * would leave unclear which side of the device the parts are on. Call with no problems left.
 */
export function checkProtectedSegments(r: CaseReader, segments: readonly Segment[], stations: readonly Station[]): void {
  for (const seg of segments) {
    if (seg.slipTorque === undefined && seg.shearTorque === undefined) continue;
    const inside = stations.find((s) => s.parts.length > 0 && s.at > seg.start + 1e-9 && s.at < seg.end - 1e-9);
    if (inside) {
      const key = seg.slipTorque !== undefined ? 'slip_torque' : 'shear_torque';
      r.fail('E_MODEL', ['shaft', 'segments', seg.index, key], `station "${inside.name}" with parts lies inside this segment, so it is unclear which side of the ${key === 'slip_torque' ? 'limiter' : 'shear pin'} its parts are on; split the segment at the station and put ${key} on the piece that holds the device`);
    }
  }
}

function fmtMm(m: number): string {
  return `${Number((m * 1000).toPrecision(3))} mm`;
}
