import type { CaseReader } from './case-reader.ts';
import { keysOf, OBSERVED_SHAPE, shapeAt, TWIST_SHAPE } from './case-shape.ts';
import type { FractureType, Observed, Photo, Station, TwistMeasurement } from './case.ts';

const OBSERVED_KEYS = keysOf(OBSERVED_SHAPE);
const FRACTURE_TYPES: FractureType[] = ['none', 'transverse', 'helical', 'fatigue', 'unknown'];

/** The `observed:` section: measured permanent twist, the fracture, free text and photos. */
export function readObserved(r: CaseReader, stations: readonly Station[]): Observed {
  const observed: Observed = { permanentTwist: [], photos: [] };
  if (!r.map(['observed'], OBSERVED_KEYS)) return observed;
  const names = stations.map((s) => s.name);

  const nt = r.list(['observed', 'permanent_twist']);
  for (let i = 0; i < nt; i++) {
    const path = ['observed', 'permanent_twist', i];
    if (!r.map(path, keysOf(TWIST_SHAPE), { required: true })) continue;
    const between = readBetween(r, [...path, 'between'], names);
    const angle = r.quantity([...path, 'angle'], 'angle', { required: true, nonNegative: true, example: 'the measured offset, such as "3.5 deg"' });
    const method = r.string([...path, 'method']);
    if (between && angle) observed.permanentTwist.push({ between, angle: angle.value, method } satisfies TwistMeasurement);
  }

  if (r.map(['observed', 'fracture'], keysOf(shapeAt(['fracture'], OBSERVED_SHAPE)!))) {
    const type = r.string(['observed', 'fracture', 'type'], { required: true, allowed: FRACTURE_TYPES, example: FRACTURE_TYPES.join(', ') }) as FractureType | undefined;
    let at: string | number | undefined = r.string(['observed', 'fracture', 'at']);
    if (at !== undefined && !names.includes(at)) {
      const q = /\d/.test(at) ? r.quantity(['observed', 'fracture', 'at'], 'length', { nonNegative: true }) : undefined;
      if (q) at = q.value;
      else if (!/\d/.test(at)) r.fail('E_REFERENCE', ['observed', 'fracture', 'at'], `no station is named "${at}"; give a station name or a position such as "240 mm"`);
      else at = undefined;
    }
    if (type) observed.fracture = { type, at, notes: r.string(['observed', 'fracture', 'notes']) };
  }

  for (const key of ['key', 'hub', 'other', 'notes'] as const) {
    const v = r.string(['observed', key]);
    if (v !== undefined) observed[key] = v;
  }

  const np = r.list(['observed', 'photos']);
  for (let i = 0; i < np; i++) {
    const path = ['observed', 'photos', i];
    if (!r.map(path, keysOf(shapeAt(['photos', 0], OBSERVED_SHAPE)!), { required: true })) continue;
    const p = r.string([...path, 'path'], { required: true, example: 'a path inside the case folder such as "photos/keyway.jpg"' });
    if (p === undefined) continue;
    if (!isInsideFolder(p)) {
      r.fail('E_RANGE', [...path, 'path'], `"${p}" points outside the case folder; put the photo in the case's photos/ folder and give "photos/${p.split(/[\\/]/).pop()}"`);
      continue;
    }
    observed.photos.push({ path: p, caption: r.string([...path, 'caption']) } satisfies Photo);
  }
  return observed;
}

function readBetween(r: CaseReader, path: (string | number)[], names: readonly string[]): [string, string] | undefined {
  const n = r.list(path, { required: true, example: 'two station names, such as [drive sheave, rotor]' });
  if (n === 0) return undefined;
  if (n !== 2) {
    r.fail('E_RANGE', path, 'give exactly two station names, such as [drive sheave, rotor]');
    return undefined;
  }
  const pair = [r.string([...path, 0]), r.string([...path, 1])];
  let ok = true;
  pair.forEach((name, i) => {
    if (name !== undefined && !names.includes(name)) {
      r.fail('E_REFERENCE', [...path, i], `no station is named "${name}"; give one of ${names.map((x) => `"${x}"`).join(', ')}`);
      ok = false;
    }
  });
  if (!ok || pair[0] === undefined || pair[1] === undefined) return undefined;
  if (pair[0] === pair[1]) {
    r.fail('E_RANGE', path, 'the two stations must differ');
    return undefined;
  }
  return [pair[0], pair[1]];
}

/** A relative path that stays inside the folder it is relative to (no absolute path, no `..` out). */
export function isInsideFolder(p: string): boolean {
  if (p === '' || /^([a-zA-Z]:)?[\\/]/.test(p) || p.includes('\0')) return false;
  let depth = 0;
  for (const part of p.split(/[\\/]+/)) {
    if (part === '..') depth--;
    else if (part !== '.' && part !== '') depth++;
    if (depth < 0) return false;
  }
  return depth > 0;
}
