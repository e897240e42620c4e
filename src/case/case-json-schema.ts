import { KIND_EXAMPLES, UNIT_FACTORS, type QuantityKind } from '../units/unit-table.ts';
import { CASE_SHAPE, type Field, type Shape } from './case-shape.ts';

type Json = Record<string, unknown>;

/**
 * A number with a unit as the reader takes it (src/units/quantity.ts): a decimal, or a whole number
 * with a fraction ("1 7/16 in"), then a unit, then an optional ± band ("± 2 %", "+/- 0.05 mm").
 * The schema checks the form; the reader checks the unit's spelling against its kind.
 */
const QUANTITY_PATTERN = String.raw`^\s*(?:(?:\d+[ -])?\d+/\d+|[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*[^\s\d±+\-.][^±]*?(?:\s*(?:±|\+/-)\s*[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?\s*[^±]*)?$`;
/** The same with the unit optional: a fraction may be a plain number or a percentage. */
const FRACTION_PATTERN = QUANTITY_PATTERN.replace(String.raw`\s*[^\s\d±+\-.][^±]*?(?:`, String.raw`\s*(?:[^\s\d±+\-.][^±]*?)?(?:`);
/** An ISO 8601 date or date-time (the reader also checks that the day exists). */
const DATE_PATTERN = String.raw`^\d{4}-\d{2}-\d{2}(?:[T ]\d{2}:\d{2}(?::\d{2}(?:\.\d+)?)?(?:Z|[+-]\d{2}:?\d{2})?)?$`;

function units(kind: QuantityKind): string {
  return Object.keys(UNIT_FACTORS[kind]).join(', ');
}

function quantitySchema(kind: QuantityKind, about: string | undefined): Json {
  const text = `${about ?? ''} ${KIND_EXAMPLES[kind].replace(/^./, (c) => c.toUpperCase())}; units: ${units(kind)}; a ± band may follow ("± 2 %").`.trim();
  return kind === 'fraction' ? { type: ['string', 'number'], pattern: FRACTION_PATTERN, description: text } : { type: 'string', pattern: QUANTITY_PATTERN, description: text };
}

function shapeSchema(s: Shape): Json {
  const description = s.about ? { description: s.about } : {};
  switch (s.type) {
    case 'quantity':
      return quantitySchema(s.kind, s.about);
    case 'number':
      return { type: s.integer ? 'integer' : 'number', ...(s.min !== undefined ? { minimum: s.min } : {}), ...(s.max !== undefined ? { maximum: s.max } : {}), ...description };
    case 'boolean':
      return { type: 'boolean', ...description };
    case 'text':
      if (s.allowed) return { type: 'string', enum: [...s.allowed], ...description };
      if (s.date) return { type: 'string', pattern: DATE_PATTERN, ...description };
      // The reader takes a number or a date as its text (an id of 42, a name of 7).
      return { type: ['string', 'number'], ...description };
    case 'list':
      return { type: 'array', items: shapeSchema(s.of), ...(s.min !== undefined ? { minItems: s.min } : {}), ...(s.max !== undefined ? { maxItems: s.max } : {}), ...description };
    case 'named':
      return { type: 'object', additionalProperties: shapeSchema(s.of), ...description };
    case 'mapping':
      return mappingSchema(s.keys, s.about);
  }
}

/**
 * A field the file leaves empty (`ticket:`) is absent to the reader, so it may be null: a required
 * one too, so that a fresh template (its required values still to fill in) is a valid form in an
 * editor; `shaftcase check` names each required value still empty with its line.
 */
function fieldSchema(f: Field): Json {
  const schema = shapeSchema(f.shape);
  if (f.example !== undefined) schema.examples = [f.example];
  return { anyOf: [schema, { type: 'null' }], ...(schema.description ? { description: schema.description } : {}) };
}

function mappingSchema(keys: Record<string, Field>, about: string | undefined): Json {
  const entries = Object.entries(keys);
  const schema: Json = {
    type: 'object',
    properties: Object.fromEntries(entries.map(([k, f]) => [k, fieldSchema(f)])),
    additionalProperties: false,
    ...(about ? { description: about } : {}),
  };
  const required = entries.filter(([, f]) => f.required).map(([k]) => k);
  if (required.length > 0) schema.required = required;
  // Keys that belong to one variant (a part's shape) are refused with the others.
  const by = entries.find(([, f]) => f.when)?.[1].when?.key;
  if (by) {
    const values = (keys[by].shape.type === 'text' && keys[by].shape.allowed) || [];
    schema.allOf = values.map((v) => ({
      if: { properties: { [by]: { const: v } }, required: [by] },
      then: { properties: Object.fromEntries(entries.filter(([, f]) => f.when && !f.when.values.includes(v)).map(([k]) => [k, false])) },
    }));
  }
  return schema;
}

/** The JSON Schema (draft 2020-12) of a case file, made from the case's description. */
export function caseJsonSchema(): Json {
  return {
    $schema: 'https://json-schema.org/draft/2020-12/schema',
    title: 'shaftcase case file',
    ...mappingSchema((CASE_SHAPE as Extract<Shape, { type: 'mapping' }>).keys, CASE_SHAPE.about),
  };
}
