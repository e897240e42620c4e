import type { CyclicProperties } from '../materials/material.ts';
import type { CaseReader } from './case-reader.ts';
import { CYCLIC_LIMITS } from './limits.ts';

/** The case-file names of the cyclic constants, in the order a data sheet gives them. */
export const CYCLIC_FIELDS = {
  cyclic_strength_coefficient: 'cyclicStrengthCoefficient',
  cyclic_hardening_exponent: 'cyclicHardeningExponent',
  fatigue_strength_coefficient: 'fatigueStrengthCoefficient',
  fatigue_strength_exponent: 'fatigueStrengthExponent',
  fatigue_ductility_coefficient: 'fatigueDuctilityCoefficient',
  fatigue_ductility_exponent: 'fatigueDuctilityExponent',
} as const satisfies Record<string, keyof CyclicProperties>;

const EXAMPLES: Record<keyof typeof CYCLIC_FIELDS, string> = {
  cyclic_strength_coefficient: 'a stress such as "1344 MPa"',
  cyclic_hardening_exponent: 'a plain number such as 0.18',
  fatigue_strength_coefficient: 'a stress such as "1227 MPa"',
  fatigue_strength_exponent: 'a negative plain number such as -0.095',
  fatigue_ductility_coefficient: 'a plain number such as 1.0',
  fatigue_ductility_exponent: 'a negative plain number such as -0.66',
};

/**
 * The cyclic constants of a case material at `path`: all six or none (a partial set would mix
 * measured and estimated constants of one curve). K′ and σ′_f are stresses with units; the
 * exponents and ε′_f are plain numbers.
 */
export function readCyclicProperties(r: CaseReader, path: (string | number)[]): CyclicProperties | undefined {
  const given = Object.keys(CYCLIC_FIELDS).filter((f) => r.has([...path, f]));
  if (given.length === 0) return undefined;
  const out: Partial<Record<keyof CyclicProperties, number>> = {};
  for (const [field, prop] of Object.entries(CYCLIC_FIELDS) as [keyof typeof CYCLIC_FIELDS, keyof CyclicProperties][]) {
    if (!r.has([...path, field])) continue;
    if (field === 'cyclic_strength_coefficient' || field === 'fatigue_strength_coefficient') {
      const q = r.quantity([...path, field], 'stress', { positive: true, example: EXAMPLES[field] });
      if (q) out[prop] = q.value;
    } else {
      const [min, max] = CYCLIC_LIMITS[field];
      const v = r.number([...path, field], { example: `${EXAMPLES[field]} (${min} to ${max})`, min, max });
      if (v !== undefined) out[prop] = v;
    }
  }
  const missing = Object.keys(CYCLIC_FIELDS).filter((f) => !given.includes(f));
  if (missing.length > 0) {
    r.fail(
      'E_MATERIAL',
      [...path, given[0]],
      `gives ${given.length} of the six cyclic constants; give all six (${missing.map((f) => `${f}: ${EXAMPLES[f as keyof typeof CYCLIC_FIELDS].replace(/^.* such as /, '')}`).join(', ')}) or none, and the fatigue estimate uses the uniform material law`,
    );
    return undefined;
  }
  return Object.keys(out).length === 6 ? (out as CyclicProperties) : undefined;
}
