import type { Material } from '../materials/material.ts';
import type { CaseReader } from './case-reader.ts';
import type { Segment, Station } from './case.ts';
import { keysOf, SEGMENT_SHAPE, SHAFT_SHAPE, shapeAt } from './case-shape.ts';
import { NUMBER_LIMITS, SIZE_LIMITS } from './limits.ts';
import { resolveMaterial } from './read-materials.ts';

const SEGMENT_KEYS = keysOf(SEGMENT_SHAPE);
const COUPLING_KEYS = keysOf(shapeAt(['coupling'], SEGMENT_SHAPE)!);

/** The shaft's segments in order from its start, with positions accumulated. */
export function readShaft(r: CaseReader, caseMaterials: Record<string, Material>, used: Record<string, Material>): { segments: Segment[]; length: number } {
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
    const coupling = readCoupling(r, [...path, 'coupling']);
    const damping = readDampingRatio(r, [...path, 'damping_ratio'], 'the material damping of this segment\'s shaft, such as "0.5 %" or 0.005');
    const backlash = r.quantity([...path, 'backlash'], 'angle', {
      positive: true,
      example: 'the play at this shaft, measured by rocking it with the other side held (dial gauge on a radius: arc ÷ radius), such as "0.5 deg"',
    });
    if (backlash && (protection.slipTorque !== undefined || protection.shearTorque !== undefined)) {
      r.fail('E_MODEL', [...path, 'backlash'], 'a segment with a limiter or shear pin cannot also hold the backlash; split the segment and put the backlash on its own piece');
    }
    const materialKey = r.string([...path, 'material']) ?? shaftMaterial;
    if (diameter && bore && bore.value >= diameter.value) {
      r.fail(
        'E_RANGE',
        [...path, 'bore'],
        `the bore must be smaller than the diameter (${fmtMm(diameter.value)}); give a bore such as "${fmtMm(diameter.value * 0.5)}", or leave it out for a solid segment`,
      );
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
      ...(coupling ? { coupling } : {}),
      ...(backlash ? { backlash: backlash.value } : {}),
      ...(damping !== undefined ? { dampingRatio: damping } : {}),
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
 * A segment's `coupling: { stiffness, rated_torque, peak_torque, damping_ratio }` from the
 * coupling's data sheet; no stiffness: a rigid coupling, checked for its rating only. The damping is
 * read as a ratio ζ of critical. Makers of elastomeric couplings often give the relative damping
 * ψ = ΔW/W_el instead, the energy one cycle dissipates over the elastic energy at its amplitude
 * (DIN 740-2; from memory, verify); for a viscous damper at resonance ΔW = π·c·ω·A² = 2πζ·k·A² and
 * W_el = ½k·A², so ψ = 4πζ and ζ = ψ/(4π) (derived here), which the template and the example say.
 */
function readCoupling(r: CaseReader, path: (string | number)[]): Segment['coupling'] {
  if (!r.map(path, COUPLING_KEYS, { example: 'a mapping such as { stiffness: 120 kN*m/rad, rated_torque: 4 kN*m, peak_torque: 8 kN*m }' })) return undefined;
  const stiffness = r.quantity([...path, 'stiffness'], 'stiffness', {
    positive: true,
    example: 'the coupling\'s dynamic torsional stiffness from its data sheet, such as "120 kN*m/rad" or "2100 N*m/deg"',
  });
  const rated = r.quantity([...path, 'rated_torque'], 'torque', { required: true, positive: true, example: 'the coupling\'s rated (nominal) torque from its data sheet, such as "4 kN*m"' });
  const peak = r.quantity([...path, 'peak_torque'], 'torque', { positive: true, example: 'the coupling\'s maximum (peak) torque from its data sheet, such as "8 kN*m"' });
  if (rated && peak && peak.value < rated.value) {
    r.fail(
      'E_RANGE',
      [...path, 'peak_torque'],
      `is below the rated torque; a coupling's maximum torque is at least its rated one, often 2 to 3 times it, such as "${Number((rated.value * 2).toPrecision(3))} N*m"`,
    );
    return undefined;
  }
  const damping = readDampingRatio(
    r,
    [...path, 'damping_ratio'],
    'the coupling\'s damping ratio from its data sheet, such as "8 %" or 0.08 (a relative damping ψ on the sheet: ψ/(4π), so ψ = 1 gives 0.08)',
  );
  if (!rated) return undefined;
  return {
    ratedTorque: rated.value,
    ...(stiffness ? { stiffness: stiffness.value } : {}),
    ...(peak ? { peakTorque: peak.value } : {}),
    ...(damping !== undefined ? { dampingRatio: damping } : {}),
  };
}

/**
 * A damping ratio (fraction of critical) of one element: 0 up to, not including, 1 (critical).
 * Undefined when absent or refused.
 */
function readDampingRatio(r: CaseReader, path: (string | number)[], example: string): number | undefined {
  const q = r.quantity(path, 'fraction', { nonNegative: true, limit: { min: 1e-6, max: 1e3, text: '0.0001 % up' }, example });
  if (!q) return undefined;
  if (q.value >= 1) {
    r.fail('E_RANGE', path, `${q.value} is not below 1 (critical damping); give ${example}`);
    return undefined;
  }
  return q.value;
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
      r.fail(
        'E_MODEL',
        ['shaft', 'segments', seg.index, key],
        `station "${inside.name}" with parts lies inside this segment, so it is unclear which side of the ${key === 'slip_torque' ? 'limiter' : 'shear pin'} its parts are on; split the segment at the station and put ${key} on the piece that holds the device`,
      );
    }
  }
}

/**
 * A coupling sits somewhere in its segment; a station inside that segment (the stop among them)
 * would leave unclear on which side of the coupling it is. Call with no problems left.
 */
export function checkCouplingSegments(r: CaseReader, segments: readonly Segment[], stations: readonly Station[]): void {
  for (const seg of segments) {
    for (const key of ['coupling', 'backlash'] as const) {
      if (seg[key] === undefined) continue;
      const inside = stations.find((s) => s.at > seg.start + 1e-9 && s.at < seg.end - 1e-9);
      if (inside)
        r.fail(
          'E_MODEL',
          ['shaft', 'segments', seg.index, key],
          `station "${inside.name}" lies inside this segment, so it is unclear which side of the ${key === 'coupling' ? 'coupling' : 'gap'} it is on; split the segment at the station and put the ${key} on one of the pieces`,
        );
    }
  }
}

function fmtMm(m: number): string {
  return `${Number((m * 1000).toPrecision(3))} mm`;
}
