import { discInertia, massInertia } from '../physics/inertia.ts';
import type { Material } from '../materials/material.ts';
import type { CaseReader } from './case-reader.ts';
import type { Part, PartShape, Station } from './case.ts';
import { readDrive } from './read-drive.ts';
import { readKey } from './read-key.ts';
import { keysOf, PART_SHAPE, STATION_SHAPE } from './case-shape.ts';
import { readFit } from './read-fit.ts';
import { readBackstop, readGearbox } from './read-gearbox.ts';
import { NUMBER_LIMITS, SIZE_LIMITS } from './limits.ts';
import { resolveMaterial } from './read-materials.ts';

const STATION_KEYS = keysOf(STATION_SHAPE);
const SHAPES: PartShape[] = ['disc', 'inertia', 'mass'];

/** Stations with their parts and drives; each part's inertia worked out from its shape. */
export function readStations(r: CaseReader, shaftLength: number, caseMaterials: Record<string, Material>, used: Record<string, Material>): Station[] {
  const stations: Station[] = [];
  const n = r.list(['stations'], { required: true, example: 'a list of stations, each with name, at and parts', max: SIZE_LIMITS.stations, what: 'stations' });
  const seen = new Map<string, number>();
  for (let i = 0; i < n; i++) {
    const path = ['stations', i];
    if (!r.map(path, STATION_KEYS, { required: true })) continue;
    const name = r.string([...path, 'name'], { required: true, example: 'a name such as "rotor" or "drive pulley"' });
    const at = r.quantity([...path, 'at'], 'length', { required: true, nonNegative: true, example: 'a distance from the shaft\'s start such as "350 mm"' });
    if (name !== undefined) {
      if (seen.has(name)) r.fail('E_RANGE', [...path, 'name'], `"${name}" is already the name of stations[${seen.get(name)}]; give each station its own name`);
      else seen.set(name, i);
    }
    if (at && shaftLength > 0 && at.value > shaftLength * (1 + 1e-9)) {
      r.fail('E_RANGE', [...path, 'at'], `lies off the shaft, which is ${Number((shaftLength * 1000).toPrecision(4))} mm long; give a distance from 0 to the shaft's length`);
    }
    const parts: Part[] = [];
    const np = r.list([...path, 'parts'], { max: SIZE_LIMITS.partsPerStation, what: 'parts' });
    for (let j = 0; j < np; j++) {
      const part = readPart(r, [...path, 'parts', j], caseMaterials, used);
      if (part) parts.push(part);
    }
    const gearbox = r.has([...path, 'gearbox']) ? readGearbox(r, [...path, 'gearbox']) : undefined;
    const drive = r.has([...path, 'drive']) ? readDrive(r, [...path, 'drive'], parts, gearbox?.ratio) : undefined;
    const backstop = readBackstop(r, path);
    const key = readKey(r, [...path, 'key'], caseMaterials, used);
    const fit = readFit(r, [...path, 'fit'], caseMaterials, used);
    if (name !== undefined && at) {
      const station: Station = { name, at: Math.min(at.value, shaftLength), parts };
      if (drive) station.drive = drive;
      if (key) station.key = key;
      if (fit) station.fit = fit;
      if (gearbox) station.gearbox = gearbox;
      if (backstop) station.backstop = backstop;
      stations.push(station);
    }
  }
  return stations;
}

function readPart(r: CaseReader, path: (string | number)[], caseMaterials: Record<string, Material>, used: Record<string, Material>): Part | undefined {
  const shape = r.string([...path, 'shape'], { required: true, allowed: SHAPES, example: 'one of disc, inertia, mass' }) as PartShape | undefined;
  if (!shape) {
    r.map(path, keysOf(PART_SHAPE));
    return undefined;
  }
  if (!r.map(path, keysOf(PART_SHAPE, shape), { required: true })) return undefined;
  const count = r.number([...path, 'count'], { example: 'a whole number from 1 to 10000, such as 2', integer: true, min: NUMBER_LIMITS.count[0], max: NUMBER_LIMITS.count[1] }) ?? 1;
  const speedRatio =
    r.number([...path, 'speed_ratio'], { example: "the part's speed over the shaft's, from 0.001 to 1000, such as 2.5", min: NUMBER_LIMITS.speedRatio[0], max: NUMBER_LIMITS.speedRatio[1] }) ?? 1;
  const name = r.string([...path, 'name']) ?? `${shape} ${Number(path[3]) + 1}`;
  const ratedSpeed = r.quantity([...path, 'rated_speed'], 'angular_speed', { positive: true, example: 'the highest speed marked on the wheel, such as "3600 rpm"' });
  const base = { name, shape, count, speedRatio, ...(ratedSpeed ? { ratedSpeed: ratedSpeed.value } : {}) };

  if (shape === 'inertia') {
    const j = r.quantity([...path, 'inertia'], 'inertia', { required: true, positive: true });
    return j && { ...base, inertia: j.value, dimensions: { inertia: j.value } };
  }
  if (shape === 'mass') {
    const m = r.quantity([...path, 'mass'], 'mass', { required: true, positive: true });
    const k = r.quantity([...path, 'radius_of_gyration'], 'length', { required: true, positive: true });
    return m && k && { ...base, inertia: massInertia(m.value, k.value), dimensions: { mass: m.value, radius_of_gyration: k.value } };
  }
  const d = r.quantity([...path, 'diameter'], 'length', { required: true, positive: true });
  const t = r.quantity([...path, 'thickness'], 'length', { required: true, positive: true });
  const bore = r.quantity([...path, 'bore'], 'length', { nonNegative: true });
  if (d && bore && bore.value >= d.value) r.fail('E_RANGE', [...path, 'bore'], "the bore must be smaller than the disc's diameter; leave it out for a solid disc");
  let density = r.quantity([...path, 'density'], 'density', { positive: true })?.value;
  const materialKey = r.string([...path, 'material']);
  if (materialKey !== undefined && r.has([...path, 'density'])) {
    r.fail('E_RANGE', [...path, 'density'], 'give either material or density for a disc, not both');
  } else if (materialKey !== undefined) {
    density = resolveMaterial(r, [...path, 'material'], materialKey, caseMaterials, ['density'], used)?.density;
  } else if (density === undefined) {
    r.fail('E_MISSING', [...path, 'material'], 'a disc needs material (such as "aisi-1045-cd") or density (such as "7850 kg/m^3")');
  }
  if (!d || !t || density === undefined || (bore && bore.value >= d.value)) return undefined;
  const b = bore?.value ?? 0;
  return {
    ...base,
    inertia: discInertia(density, t.value, d.value, b),
    dimensions: { diameter: d.value, thickness: t.value, bore: b, density },
    material: materialKey,
  };
}
