import type { Material } from '../materials/material.ts';
import type { CaseReader, Path } from './case-reader.ts';
import type { HubFit } from './case.ts';
import { FIT_SHAPE, keysOf } from './case-shape.ts';
import { NUMBER_LIMITS } from './limits.ts';
import { resolveMaterial } from './read-materials.ts';

const FIT_KEYS = keysOf(FIT_SHAPE);

/**
 * A station's `fit: {interference, hub_outer_diameter, length, friction, hub_material}`: a shrink or
 * press fit; undefined when absent or wrong. The hub's material needs E and Poisson's ratio.
 */
export function readFit(r: CaseReader, path: Path, caseMaterials: Record<string, Material>, used: Record<string, Material>): HubFit | undefined {
  if (!r.map(path, FIT_KEYS, { example: 'a mapping such as { interference: 0.05 mm, hub_outer_diameter: 110 mm, length: 60 mm, friction: 0.12, hub_material: aisi-1045-hr }' })) return undefined;
  const interference = r.quantity([...path, 'interference'], 'length', {
    required: true,
    positive: true,
    limit: { min: 1e-7, max: 0.01, text: '0.1 um to 10 mm' },
    example: 'the diametral interference, shaft diameter less hub bore, from the drawing\'s fit (H7/s6 on 60 mm: about 0.05 mm), such as "0.05 mm"',
  });
  const outer = r.quantity([...path, 'hub_outer_diameter'], 'length', { required: true, positive: true, example: 'the hub\'s outer diameter over the seat, such as "110 mm"' });
  const length = r.quantity([...path, 'length'], 'length', { required: true, positive: true, example: 'the length of the fit along the shaft, such as "60 mm"' });
  const friction = r.number([...path, 'friction'], {
    required: true,
    example: 'the coefficient of friction at the seat, such as 0.12 (dry steel on steel, shrink fit) or 0.08 (oiled press fit)',
    min: NUMBER_LIMITS.friction[0],
    max: NUMBER_LIMITS.friction[1],
  });
  const key = r.string([...path, 'hub_material'], { required: true, example: 'the hub\'s material, such as "aisi-1045-hr"' });
  const hub = key === undefined ? undefined : resolveMaterial(r, [...path, 'hub_material'], key, caseMaterials, ['elastic_modulus', 'poisson_ratio'], used);
  if (!interference || !outer || !length || friction === undefined || !hub) return undefined;
  return { interference: interference.value, hubOuterDiameter: outer.value, length: length.value, friction, hubMaterial: hub.key };
}

/**
 * Checks needing the shaft: the hub's outer diameter is over the seat, the interference is small
 * beside the seat, and the shaft's material has E and Poisson's ratio. `seat` gives the seat's
 * diameter and the shaft's material key of a station. Call with no problems left.
 */
export function checkFitSeat(r: CaseReader, path: Path, fit: HubFit, seatDiameter: number, shaftMaterial: Material): void {
  const mm = (m: number) => `${Number((m * 1000).toPrecision(3))} mm`;
  if (fit.hubOuterDiameter <= seatDiameter * (1 + 1e-9)) {
    r.fail(
      'E_RANGE',
      [...path, 'hub_outer_diameter'],
      `is not larger than the shaft's diameter at the seat (${mm(seatDiameter)}); give the hub's outside diameter over the seat, such as "${mm(seatDiameter * 2)}"`,
    );
  }
  if (fit.interference > 0.01 * seatDiameter) {
    r.fail(
      'E_RANGE',
      [...path, 'interference'],
      `is more than 1 % of the seat's diameter (${mm(seatDiameter)}); an interference fit is a few parts in ten thousand of it: give the diametral interference, such as "${mm(seatDiameter * 8e-4)}"`,
    );
  }
  const missing = (['elasticModulus', 'poissonRatio'] as const).filter((f) => shaftMaterial[f] === undefined);
  if (missing.length > 0) {
    r.fail(
      'E_MATERIAL',
      [...path, 'interference'],
      `the shaft's material "${shaftMaterial.key}" at this seat has no ${missing.map((f) => (f === 'elasticModulus' ? 'elastic_modulus' : 'poisson_ratio')).join(' or ')}, which a fit needs; add it under materials.${shaftMaterial.key}, e.g. elastic_modulus: "207 GPa", poisson_ratio: 0.29`,
    );
  }
}
