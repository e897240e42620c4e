import type { Material } from './material.ts';

/**
 * The family of a material as a shaft shop buys and works it. Materials of one family share a
 * stiffness, a way of machining and fitting, and a behaviour in fatigue and corrosion close enough
 * that one replaces another on the same drawing; across families none of that holds.
 */
export type MaterialFamily = 'carbon and alloy steel' | 'stainless steel' | 'aluminium alloy' | 'cast iron' | 'titanium alloy' | 'copper alloy';

/** Words of a material's key or name that say its family, checked in this order (stainless before steel, cast iron before iron-free words). */
const FAMILY_WORDS: [RegExp, MaterialFamily][] = [
  [/stainless|^ss-|17-4\s?ph/i, 'stainless steel'],
  [/alumin|^al-/i, 'aluminium alloy'],
  [/\biron\b|-iron-/i, 'cast iron'],
  [/titanium|^ti-/i, 'titanium alloy'],
  [/bronze|brass|copper/i, 'copper alloy'],
  [/steel|^aisi-|^sae-|^en\d|^c\d{2}/i, 'carbon and alloy steel'],
];

/** A material's family from its key and name; undefined where neither says it (a case's own material with a name of its own). */
export function materialFamily(m: Pick<Material, 'key' | 'name'>): MaterialFamily | undefined {
  for (const [words, family] of FAMILY_WORDS) if (words.test(m.key) || words.test(m.name)) return family;
  return undefined;
}
