import type { CaseReader, Path } from './case-reader.ts';
import type { Backstop, Gearbox } from './case.ts';
import { GEARBOX_SHAPE, keysOf } from './case-shape.ts';
import { NUMBER_LIMITS } from './limits.ts';

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
  if (ratio === undefined || !rated) return undefined;
  return { ratio, ratedOutputTorque: rated.value, serviceFactor, efficiency, backDrivable };
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
