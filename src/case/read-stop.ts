import type { CaseReader } from './case-reader.ts';
import type { Stop } from './case.ts';
import { keysOf, STOP_SHAPE } from './case-shape.ts';

const STOP_KEYS = keysOf(STOP_SHAPE);

/** The `stop:` section: where the shaft stopped, how long the stop took, and what the jam could hold. */
export function readStop(r: CaseReader): Partial<Stop> {
  r.map(['stop'], STOP_KEYS, { required: true, example: 'a mapping with at: the name of the station that stopped' });
  const at = r.string(['stop', 'at'], { required: true, example: 'the name of the station that stopped' });
  const duration = r.quantity(['stop', 'duration'], 'time', { nonNegative: true });
  const capacity = r.quantity(['stop', 'torque_capacity'], 'torque', {
    positive: true,
    example: 'the most torque the jam could hold before it slipped, such as "2500 N*m"',
  });
  const stop: Partial<Stop> = { at, duration: duration?.value ?? 0 };
  if (capacity) stop.torqueCapacity = capacity.value;
  return stop;
}
