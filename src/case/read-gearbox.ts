import type { CaseReader, Path } from './case-reader.ts';
import type { Backstop, Gearbox } from './case.ts';
import { GEARBOX_SHAPE, keysOf } from './case-shape.ts';
import { NUMBER_LIMITS } from './limits.ts';
import { LEWIS_MIN_TEETH } from '../physics/lewis.ts';

const GEARBOX_KEYS = keysOf(GEARBOX_SHAPE);

/**
 * A station's `gearbox: {ratio, rated_output_torque, service_factor?, efficiency?, back_drivable?}`;
 * undefined when absent or wrong. The service factor and the efficiency default to 1, and the unit
 * is taken as back-drivable unless the case says `back_drivable: false`.
 */
export function readGearbox(r: CaseReader, path: Path): Gearbox | undefined {
  if (!r.map(path, GEARBOX_KEYS, { example: 'a mapping such as { ratio: 19.4, rated_output_torque: 2.65 kN*m, service_factor: 2, efficiency: 0.96, back_drivable: true }' })) return undefined;
  const ratio = r.number([...path, 'ratio'], {
    required: true,
    example: "the gear unit's ratio, input speed over output speed, from the nameplate, from 0.001 to 1000, such as 19.4",
    min: NUMBER_LIMITS.speedRatio[0],
    max: NUMBER_LIMITS.speedRatio[1],
  });
  const rated = r.quantity([...path, 'rated_output_torque'], 'torque', {
    required: true,
    positive: true,
    example: 'the output torque on the gearmotor\'s nameplate (M2), or a bare gear unit\'s rated torque from its catalogue, such as "2.65 kN*m"',
  });
  const serviceFactor =
    r.number([...path, 'service_factor'], {
      example: 'the service factor fB on the nameplate or in the catalogue, from 1 to 10, such as 2',
      min: NUMBER_LIMITS.factor[0],
      max: NUMBER_LIMITS.factor[1],
    }) ?? 1;
  const efficiency =
    r.number([...path, 'efficiency'], {
      example: "the gear unit's efficiency as a fraction above 0 and at most 1, such as 0.96 (helical) or 0.6 (worm)",
      min: NUMBER_LIMITS.efficiency[0],
      max: NUMBER_LIMITS.efficiency[1],
    }) ?? 1;
  const backDrivable = r.boolean([...path, 'back_drivable']) ?? true;
  const module = r.quantity([...path, 'module'], 'length', { positive: true, example: 'the output gear\'s module from the drawing or the maker, such as "4 mm" (25.4 mm over a diametral pitch)' });
  const faceWidth = r.quantity([...path, 'face_width'], 'length', { positive: true, example: 'the output gear\'s face width, such as "60 mm"' });
  const teeth = r.number([...path, 'teeth'], {
    integer: true,
    min: LEWIS_MIN_TEETH,
    max: 10_000,
    example: `the output gear's tooth count, a whole number from ${LEWIS_MIN_TEETH} (the Lewis table's fewest) up, such as 78`,
  });
  const given = [module, faceWidth, teeth].filter((x) => x !== undefined).length;
  if (given > 0 && given < 3) {
    const missing = (['module', 'face_width', 'teeth'] as const).find((k, i) => [module, faceWidth, teeth][i] === undefined && !r.has([...path, k]));
    if (missing)
      r.fail('E_MISSING', [...path, missing], 'the tooth bending estimate needs module, face_width and teeth together; give all three, such as module: 4 mm, face_width: 60 mm, teeth: 78, or none');
  }
  if (ratio === undefined || !rated) return undefined;
  const g: Gearbox = { ratio, ratedOutputTorque: rated.value, serviceFactor, efficiency, backDrivable };
  if (module && faceWidth && teeth !== undefined) g.outputGear = { module: module.value, faceWidth: faceWidth.value, teeth };
  return g;
}

/** A station's `backstop: true` with its `backstop_rated_torque`; undefined without a backstop. */
export function readBackstop(r: CaseReader, station: Path): Backstop | undefined {
  const on = r.boolean([...station, 'backstop']);
  const rated = r.quantity([...station, 'backstop_rated_torque'], 'torque', {
    positive: true,
    example: 'the backstop\'s rated torque from its catalogue, such as "6 kN*m"',
  });
  if (rated && on !== true) {
    r.fail('E_RANGE', [...station, 'backstop_rated_torque'], 'is given without a backstop; add backstop: true to this station, or leave the rated torque out');
    return undefined;
  }
  if (on !== true) return undefined;
  return rated ? { ratedTorque: rated.value } : {};
}
