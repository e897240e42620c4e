import type { CaseReader, Path } from './case-reader.ts';
import type { BeltSpec } from './case.ts';
import { BELT_SHAPE, keysOf } from './case-shape.ts';
import { NUMBER_LIMITS } from './limits.ts';

const BELT_KEYS = keysOf(BELT_SHAPE);
const CAPSTAN_KEYS = ['wrap_angle', 'friction', 'pulley_diameter'];

/**
 * A drive's `belt:`: either `slip_torque` (at this station's shaft), or the belt data the capstan
 * relation needs: `wrap_angle` (on the pulley that slips first, usually the small one), `friction`,
 * optional `groove_angle` (V-belts), `tension` (installed, all belts together) or
 * `tight_side_tension`, and `pulley_diameter` (of the pulley on this shaft).
 */
export function readBelt(r: CaseReader, path: Path): BeltSpec | undefined {
  if (!r.map(path, BELT_KEYS)) return undefined;
  const given = BELT_KEYS.filter((k) => r.has([...path, k]));
  if (r.has([...path, 'slip_torque'])) {
    const others = given.filter((k) => k !== 'slip_torque');
    if (others.length > 0) {
      r.fail('E_RANGE', [...path, others[0]], 'give either slip_torque or the belt data (wrap_angle, friction, tension, pulley_diameter), not both');
      return undefined;
    }
    const t = r.quantity([...path, 'slip_torque'], 'torque', { positive: true, example: 'the torque at this shaft at which the belt slips, such as "1800 N*m"' });
    return t && { kind: 'slip torque', slipTorque: t.value };
  }
  if (given.length === 0) {
    r.fail('E_MISSING', path, 'give slip_torque (such as "1800 N*m"), or wrap_angle, friction, tension and pulley_diameter');
    return undefined;
  }
  for (const k of CAPSTAN_KEYS) if (!r.has([...path, k])) r.fail('E_MISSING', [...path, k], `is required with belt data; give ${capstanExample(k)}`);
  const wrap = r.quantity([...path, 'wrap_angle'], 'angle', { positive: true, example: capstanExample('wrap_angle') });
  const friction = r.number([...path, 'friction'], { example: capstanExample('friction'), min: NUMBER_LIMITS.friction[0], max: NUMBER_LIMITS.friction[1] });
  const groove = r.quantity([...path, 'groove_angle'], 'angle', { positive: true, example: capstanExample('groove_angle') });
  const diameter = r.quantity([...path, 'pulley_diameter'], 'length', { positive: true, example: capstanExample('pulley_diameter') });
  if (wrap && wrap.value > 2 * Math.PI) r.fail('E_RANGE', [...path, 'wrap_angle'], `is more than a full turn; give the belt's wrap on the pulley, such as "160 deg"`);
  if (groove && groove.value >= Math.PI) r.fail('E_RANGE', [...path, 'groove_angle'], 'is not a groove angle; give the included angle of the V-groove, such as "38 deg"');
  const installed = r.has([...path, 'tension']);
  const tight = r.has([...path, 'tight_side_tension']);
  if (installed === tight) {
    r.fail(installed ? 'E_RANGE' : 'E_MISSING', [...path, installed ? 'tight_side_tension' : 'tension'], 'give one of tension (installed, all belts together, such as "6000 N") or tight_side_tension');
    return undefined;
  }
  const tensionPath = [...path, installed ? 'tension' : 'tight_side_tension'];
  const tension = r.quantity(tensionPath, 'force', { positive: true, example: 'a belt tension, all belts together, such as "6000 N"' });
  if (!wrap || friction === undefined || !diameter || !tension || wrap.value > 2 * Math.PI) return undefined;
  if (groove && groove.value >= Math.PI) return undefined;
  return {
    kind: 'capstan',
    wrapAngle: wrap.value,
    friction,
    ...(groove ? { grooveAngle: groove.value } : {}),
    tension: tension.value,
    tensionIs: installed ? 'installed' : 'tight side',
    pulleyDiameter: diameter.value,
  };
}

function capstanExample(key: string): string {
  const examples: Record<string, string> = {
    wrap_angle: 'the wrap on the pulley that slips first, such as "160 deg"',
    friction: 'a coefficient of friction such as 0.3',
    groove_angle: 'the V-groove\'s included angle, such as "38 deg"',
    pulley_diameter: 'the diameter of the pulley on this shaft, such as "450 mm"',
  };
  return examples[key];
}
