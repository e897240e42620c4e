import type { Material } from '../materials/material.ts';
import type { CaseReader, Path } from './case-reader.ts';
import type { ShaftKey } from './case.ts';
import { keysOf, KEY_SHAPE } from './case-shape.ts';
import { resolveMaterial } from './read-materials.ts';

const KEY_KEYS = keysOf(KEY_SHAPE);

/** A station's `key: {width, height, length, material, hub_depth?}`; undefined when absent or wrong. */
export function readKey(r: CaseReader, path: Path, caseMaterials: Record<string, Material>, used: Record<string, Material>): ShaftKey | undefined {
  if (!r.map(path, KEY_KEYS, { example: 'a mapping such as { width: 16 mm, height: 10 mm, length: 90 mm, material: aisi-1045-cd }' })) return undefined;
  const width = r.quantity([...path, 'width'], 'length', { required: true, positive: true, example: 'the key\'s width such as "16 mm" or "5/8 in"' });
  const height = r.quantity([...path, 'height'], 'length', { required: true, positive: true, example: 'the key\'s height such as "10 mm" or "5/8 in"' });
  const length = r.quantity([...path, 'length'], 'length', { required: true, positive: true, example: 'the engaged length of the key such as "90 mm" or "3 in"' });
  const hubDepth = r.quantity([...path, 'hub_depth'], 'length', { positive: true, example: 'the key\'s height above the shaft, bearing on the hub, such as "4 mm"' });
  const materialKey = r.string([...path, 'material'], { required: true, example: 'the key\'s material, such as "aisi-1045-cd"' });
  const material = materialKey === undefined ? undefined : resolveMaterial(r, [...path, 'material'], materialKey, caseMaterials, ['yield_strength'], used);
  if (height && hubDepth && hubDepth.value >= height.value) {
    r.fail(
      'E_RANGE',
      [...path, 'hub_depth'],
      `the part of the key in the hub must be less than the key's height; give the key's projection above the shaft, such as "${Number(((height.value * 1000) / 2).toPrecision(3))} mm"`,
    );
    return undefined;
  }
  if (!width || !height || !length || !material) return undefined;
  const key: ShaftKey = { width: width.value, height: height.value, length: length.value, material: material.key };
  if (hubDepth) key.hubDepth = hubDepth.value;
  return key;
}
