import { MATERIAL_FIELDS, type MaterialField } from '../materials/material.ts';
import type { QuantityKind } from '../units/unit-table.ts';
import type { Path } from './case-reader.ts';
import { CYCLIC_LIMITS, MAX_ELEMENTS, NUMBER_LIMITS } from './limits.ts';

const L = NUMBER_LIMITS;

/**
 * The keys of a case file and what each holds, said once. The readers take their lists of keys
 * from here (so a key the description lacks is an unknown key), a test checks that every value
 * they read has the type and the unit kind written here, and the case file's JSON Schema
 * (schemas/case.schema.json, for an editor's completion and checks as a case is typed) is
 * generated from it. Checks that need the whole case (a station named twice, a bore wider than its
 * segment) stay in the readers; the description says what a value is, not how it relates to others.
 */
export type Shape =
  | { type: 'mapping'; keys: Record<string, Field>; about?: string }
  /** A mapping keyed by names the user chooses (`materials:`), each holding `of`. */
  | { type: 'named'; of: Shape; about?: string }
  | { type: 'list'; of: Shape; min?: number; max?: number; about?: string }
  | { type: 'quantity'; kind: QuantityKind; about?: string }
  | { type: 'number'; integer?: boolean; min?: number; max?: number; about?: string }
  /** `or`: a text that may also be a quantity of that kind (a station's name or a position). */
  | { type: 'text'; allowed?: readonly string[]; date?: boolean; or?: QuantityKind; about?: string }
  | { type: 'boolean'; about?: string };

export interface Field {
  shape: Shape;
  required?: boolean;
  /** An example of a right value, as written in a case file. */
  example?: string | number | boolean;
  /** Only with these values of a sibling key (a part's `shape`): `{ key, values }`. */
  when?: { key: string; values: readonly string[] };
}

const quantity = (kind: QuantityKind, about: string, example: string, required = false): Field => ({ shape: { type: 'quantity', kind, about }, example, required });
const text = (about: string, example?: string, required = false): Field => ({ shape: { type: 'text', about }, example, required });
const mapping = (keys: Record<string, Field>, about: string): Shape => ({ type: 'mapping', keys, about });

export const STOP_SHAPE = mapping(
  {
    at: text('The name of the station that stopped (the jam, the seized part).', 'inlet flight', true),
    duration: quantity('time', 'How long the stop took; 0 or left out for an instant stop.', '15 ms'),
    torque_capacity: quantity('torque', 'The most torque the jam could hold before it slipped.', '2500 N*m'),
  },
  'Where the shaft stopped and how.',
);

export const SEGMENT_SHAPE = mapping(
  {
    length: quantity('length', "The segment's length along the shaft.", '120 mm', true),
    diameter: quantity('length', "The segment's outer diameter.", '55 mm', true),
    bore: quantity('length', 'The bore of a hollow segment; left out for a solid one.', '20 mm'),
    material: text("This segment's material, where it is not the shaft's: a key from `shaftcase materials` or one under materials:.", 'aisi-4140-qt'),
    kt: { shape: { type: 'number', min: L.kt[0], max: L.kt[1], about: 'The stress-concentration factor in torsion at this segment (keyseat, fillet).' }, example: 1.6 },
    label: text('A name for the segment, such as "sheave seat".', 'sheave seat'),
    slip_torque: quantity('torque', 'The slip setting of a friction torque limiter or slip coupling in this segment.', '1500 N*m'),
    shear_torque: quantity('torque', 'The torque at which a shear pin in this segment parts.', '2200 N*m'),
    coupling: {
      shape: mapping(
        {
          stiffness: quantity('stiffness', "The coupling's dynamic torsional stiffness (data sheet); left out for a rigid coupling.", '120 kN*m/rad'),
          rated_torque: quantity('torque', "The coupling's rated torque (data sheet).", '4 kN*m', true),
          peak_torque: quantity('torque', "The coupling's maximum torque (data sheet).", '8 kN*m'),
          damping_ratio: quantity('fraction', "The coupling's damping as a fraction of critical (data sheet; from a relative damping ψ, ψ/(4π)); left out: analysis.damping_ratio.", '8 %'),
        },
        'A coupling within this segment, in series with its shaft.',
      ),
    },
    damping_ratio: quantity('fraction', "This segment's own material damping as a fraction of critical; left out: analysis.damping_ratio.", '0.5 %'),
    backlash: quantity('angle', 'The play at this shaft (a gap in the gearing or a worn coupling), measured by rocking it with the other side held.', '0.5 deg'),
  },
  'One length of the shaft with one diameter, from the shaft’s start.',
);

export const SHAFT_SHAPE = mapping(
  {
    material: text("The shaft's material: a key from `shaftcase materials` or one under materials:.", 'aisi-1045-cd'),
    segments: { shape: { type: 'list', of: SEGMENT_SHAPE, min: 1, about: 'The segments in order from the shaft’s start.' }, required: true },
  },
  'The shaft as measured.',
);

const DISC = ['disc'] as const;
export const PART_SHAPE = mapping(
  {
    shape: {
      shape: { type: 'text', allowed: ['disc', 'inertia', 'mass'], about: 'How the part is given: disc (diameter, thickness, material or density), inertia, or mass with a radius of gyration.' },
      example: 'disc',
      required: true,
    },
    name: text('A name for the part.', 'sheave'),
    count: { shape: { type: 'number', integer: true, min: L.count[0], max: L.count[1], about: 'How many such parts the station carries.' }, example: 2 },
    speed_ratio: { shape: { type: 'number', min: L.speedRatio[0], max: L.speedRatio[1], about: "The part's speed over the shaft's (a motor behind a reducer: the reducer's ratio)." }, example: 2.5 },
    rated_speed: quantity('angular_speed', 'The highest speed marked on the part (an abrasive wheel).', '3600 rpm'),
    diameter: { ...quantity('length', "The disc's outer diameter.", '450 mm'), when: { key: 'shape', values: DISC } },
    thickness: { ...quantity('length', "The disc's thickness (its width along the shaft).", '60 mm'), when: { key: 'shape', values: DISC } },
    bore: { ...quantity('length', "The disc's bore.", '55 mm'), when: { key: 'shape', values: DISC } },
    material: { ...text("The disc's material (for its density).", 'cast-iron-gg25'), when: { key: 'shape', values: DISC } },
    density: { ...quantity('density', "The disc's density, where no material is given.", '7850 kg/m^3'), when: { key: 'shape', values: DISC } },
    inertia: { ...quantity('inertia', "The part's moment of inertia about the shaft.", '1.8 kg*m^2'), when: { key: 'shape', values: ['inertia'] } },
    mass: { ...quantity('mass', "The part's mass.", '120 kg'), when: { key: 'shape', values: ['mass'] } },
    radius_of_gyration: { ...quantity('length', "The part's radius of gyration.", '180 mm'), when: { key: 'shape', values: ['mass'] } },
  },
  'A rotating part at a station.',
);

export const BELT_SHAPE = mapping(
  {
    slip_torque: quantity('torque', 'The torque at this shaft at which the belt slips (instead of the belt data).', '1800 N*m'),
    wrap_angle: quantity('angle', 'The wrap on the pulley that slips first, usually the small one.', '160 deg'),
    friction: { shape: { type: 'number', min: L.friction[0], max: L.friction[1], about: 'The coefficient of friction between belt and pulley.' }, example: 0.3 },
    groove_angle: quantity('angle', "A V-groove's included angle.", '38 deg'),
    tension: quantity('force', 'The installed belt tension, all belts together.', '6000 N'),
    tight_side_tension: quantity('force', "The tight side's tension, where the installed tension is not known.", '9000 N'),
    pulley_diameter: quantity('length', 'The diameter of the pulley on this shaft.', '450 mm'),
  },
  'A belt between the motor and this station: its slip torque, or the data the capstan relation needs.',
);

export const CURVE_POINT_SHAPE = mapping(
  {
    speed: quantity('angular_speed', "The motor's speed at this point.", '1200 rpm', true),
    torque: quantity('torque', "The motor's torque at this point.", '640 N*m', true),
  },
  'One point of the speed–torque curve.',
);

export const DRIVE_SHAPE = mapping(
  {
    rotor_inertia: quantity('inertia', "The motor rotor's inertia, at the motor's speed (motor data sheet; WK² in lb·ft²).", '0.42 kg*m^2'),
    speed_ratio: { shape: { type: 'number', min: L.speedRatio[0], max: L.speedRatio[1], about: "The motor's speed over the shaft's (a reducer's or belt's ratio)." }, example: 3.52 },
    power: quantity('power', "The motor's rated power (nameplate).", '75 kW'),
    running_torque: quantity('torque', "The motor's normal running torque.", '240 N*m'),
    torque: quantity('torque', "The motor's torque while it is pulled down (constant).", '580 N*m'),
    curve: { shape: { type: 'list', of: CURVE_POINT_SHAPE, min: 2, about: "The motor's speed–torque curve from 0 rpm up to its synchronous speed." } },
    belt: { shape: BELT_SHAPE },
    trip_after: quantity('time', "The time from the stop after which the drive or its overload relay cut the motor (the drive's fault log).", '250 ms'),
    torque_limit: quantity('torque', 'The most torque the drive lets the motor give (its current limit, at the motor shaft).', '300 N*m'),
  },
  'A motor that keeps driving at this station.',
);

export const KEY_SHAPE = mapping(
  {
    width: quantity('length', "The key's width.", '16 mm', true),
    height: quantity('length', "The key's height.", '10 mm', true),
    length: quantity('length', 'The engaged length of the key.', '90 mm', true),
    material: text("The key's material.", 'aisi-1045-cd', true),
    hub_depth: quantity('length', "The key's height above the shaft, bearing on the hub.", '4 mm'),
  },
  "The key that joins this station's hub to the shaft.",
);

export const FIT_SHAPE = mapping(
  {
    interference: quantity('length', 'The diametral interference: shaft diameter less hub bore (from the drawing’s fit).', '0.05 mm', true),
    hub_outer_diameter: quantity('length', "The hub's outer diameter over the seat.", '110 mm', true),
    length: quantity('length', 'The length of the fit along the shaft.', '60 mm', true),
    friction: { shape: { type: 'number', min: L.friction[0], max: L.friction[1], about: 'The coefficient of friction at the seat.' }, example: 0.12, required: true },
    hub_material: text("The hub's material.", 'aisi-1045-hr', true),
  },
  "A shrink or press fit of this station's hub on the shaft.",
);

export const GEARBOX_SHAPE = mapping(
  {
    ratio: {
      shape: { type: 'number', min: L.speedRatio[0], max: L.speedRatio[1], about: "The gear stage's ratio: its input (motor side) speed over its output speed, this station's shaft (nameplate)." },
      example: 19.4,
      required: true,
    },
    rated_output_torque: quantity(
      'torque',
      "The output torque on the gearmotor's nameplate (M2 at the motor's rated power), or a bare gear unit's own rated torque from its catalogue.",
      '2.65 kN*m',
      true,
    ),
    service_factor: {
      shape: {
        type: 'number',
        min: L.factor[0],
        max: L.factor[1],
        about:
          "The service factor on the nameplate or in the catalogue (fB: the gear unit's rating over that output torque); left out: 1. The unit is checked against rated_output_torque × service_factor.",
      },
      example: 2,
    },
    efficiency: { shape: { type: 'number', min: L.efficiency[0], max: L.efficiency[1], about: "The gear unit's efficiency, forward (catalogue), above 0 and at most 1; left out: 1." }, example: 0.96 },
    back_drivable: {
      shape: {
        type: 'boolean',
        about: 'false for a self-locking worm (the catalogue says it will not back-drive, or its lead angle is below the friction angle): the load cannot turn the motor side backwards.',
      },
      example: true,
    },
    module: quantity('length', "The module of the output gear's teeth (the gear on this shaft), for a first estimate of its tooth bending stress (Lewis); 25.4 mm over a diametral pitch.", '4 mm'),
    face_width: quantity('length', "The output gear's face width (the teeth's width along the shaft).", '60 mm'),
    teeth: { shape: { type: 'number', integer: true, min: 12, max: 10_000, about: "The output gear's tooth count." }, example: 78 },
  },
  "The gear unit whose output is this station's shaft; the motor or the parts behind it turn at its ratio.",
);

export const STATION_SHAPE = mapping(
  {
    name: text('The station’s name, used by stop.at and observed twist.', 'rotor', true),
    at: quantity('length', 'Where the station sits, from the shaft’s start.', '350 mm', true),
    parts: { shape: { type: 'list', of: PART_SHAPE, about: 'The rotating parts at this station.' } },
    drive: { shape: DRIVE_SHAPE },
    key: { shape: KEY_SHAPE },
    fit: { shape: FIT_SHAPE },
    gearbox: { shape: GEARBOX_SHAPE },
    backstop: { shape: { type: 'boolean', about: 'true where a backstop (a one-way clutch, a holdback) at this station stops the shaft turning backwards.' }, example: true },
    backstop_rated_torque: quantity('torque', "The backstop's rated torque (catalogue), against which the rebound torque it held is checked.", '6 kN*m'),
  },
  'A place on the shaft: a hub, the jam, a motor.',
);

/** Material fields given with a unit (Poisson's ratio is a plain number). */
type QuantityField = Exclude<MaterialField, 'poisson_ratio'>;

const FIELD_KINDS: Record<QuantityField, QuantityKind> = {
  shear_modulus: 'stress',
  elastic_modulus: 'stress',
  density: 'density',
  yield_strength: 'stress',
  tensile_strength: 'stress',
  elongation: 'fraction',
  reduction_of_area: 'fraction',
  fracture_strain: 'fraction',
};
const FIELD_EXAMPLES: Record<QuantityField, string> = {
  shear_modulus: '80 GPa',
  elastic_modulus: '205 GPa',
  density: '7850 kg/m^3',
  yield_strength: '530 MPa',
  tensile_strength: '625 MPa',
  elongation: '12 %',
  reduction_of_area: '35 %',
  fracture_strain: '1.2',
};

/** The kind of quantity each material field holds. */
export function materialFieldKind(field: QuantityField): QuantityKind {
  return FIELD_KINDS[field];
}

export const MATERIAL_SHAPE = mapping(
  {
    name: text("The material's name.", 'AISI 1045 steel, cold drawn'),
    ...Object.fromEntries(
      (Object.keys(MATERIAL_FIELDS) as MaterialField[]).map((f) => [
        f,
        f === 'poisson_ratio'
          ? { shape: { type: 'number', min: 0, max: 0.499, about: "Poisson's ratio (data sheet)." }, example: 0.29 }
          : quantity(FIELD_KINDS[f], f.replaceAll('_', ' '), FIELD_EXAMPLES[f]),
      ]),
    ),
    // The cyclic constants (all six or none; read-cyclic-properties.ts): K′ and σ′_f with a unit, the others plain numbers.
    cyclic_strength_coefficient: quantity('stress', 'K′, the cyclic stress–strain curve’s coefficient.', '1344 MPa'),
    cyclic_hardening_exponent: {
      shape: { type: 'number', min: CYCLIC_LIMITS.cyclic_hardening_exponent[0], max: CYCLIC_LIMITS.cyclic_hardening_exponent[1], about: 'n′, the cyclic hardening exponent.' },
      example: 0.18,
    },
    fatigue_strength_coefficient: quantity('stress', 'σ′_f, the fatigue strength coefficient.', '1227 MPa'),
    fatigue_strength_exponent: {
      shape: { type: 'number', min: CYCLIC_LIMITS.fatigue_strength_exponent[0], max: CYCLIC_LIMITS.fatigue_strength_exponent[1], about: 'b, the fatigue strength exponent (negative).' },
      example: -0.095,
    },
    fatigue_ductility_coefficient: {
      shape: { type: 'number', min: CYCLIC_LIMITS.fatigue_ductility_coefficient[0], max: CYCLIC_LIMITS.fatigue_ductility_coefficient[1], about: 'ε′_f, the fatigue ductility coefficient.' },
      example: 1.0,
    },
    fatigue_ductility_exponent: {
      shape: { type: 'number', min: CYCLIC_LIMITS.fatigue_ductility_exponent[0], max: CYCLIC_LIMITS.fatigue_ductility_exponent[1], about: 'c, the fatigue ductility exponent (negative).' },
      example: -0.66,
    },
    strength_basis: { shape: { type: 'text', allowed: ['minimum', 'typical'], about: 'Whether the strengths are published minima or typical (mean) values.' }, example: 'minimum' },
    source: text('Where the values come from (a mill certificate, a handbook with its edition).', 'mill certificate 4471-B'),
  },
  'A material of this case (a mill certificate), used by its name.',
);

export const TWIST_SHAPE = mapping(
  {
    between: { shape: { type: 'list', of: { type: 'text' }, min: 2, max: 2, about: 'The two stations between which the twist was measured.' }, required: true },
    angle: quantity('angle', 'The measured permanent twist.', '3.5 deg ± 0.5 deg', true),
    method: text('How it was measured.', 'keyway-to-keyway angle with a protractor'),
  },
  'A measured permanent twist.',
);

export const OBSERVED_SHAPE = mapping(
  {
    permanent_twist: { shape: { type: 'list', of: TWIST_SHAPE } },
    fracture: {
      shape: mapping(
        {
          type: { shape: { type: 'text', allowed: ['none', 'transverse', 'helical', 'fatigue', 'unknown'], about: 'What the fracture looked like.' }, required: true, example: 'helical' },
          at: { shape: { type: 'text', or: 'length', about: 'A station name or a position from the shaft’s start.' }, example: '240 mm' },
          notes: text('What was seen.'),
        },
        'A fracture, if the shaft broke.',
      ),
    },
    key: text('The key’s condition.', 'rolled on the drive side'),
    hub: text('The hub’s condition.'),
    other: text('Anything else seen.'),
    notes: text('Notes.'),
    photos: {
      shape: {
        type: 'list',
        of: mapping({ path: text('A path inside the case folder.', 'photos/keyway.jpg', true), caption: text('What the photo shows.') }, 'A photo of the damage.'),
      },
    },
  },
  'What was seen and measured after the stop.',
);

export const ANALYSIS_SHAPE = mapping(
  {
    criterion: { shape: { type: 'text', allowed: ['distortion-energy', 'max-shear'], about: 'The yield criterion for the shear yield strength.' }, example: 'distortion-energy' },
    hardening: { shape: { type: 'text', allowed: ['none', 'linear'], about: 'Hardening past yield.' }, example: 'none' },
    elements: { shape: { type: 'number', integer: true, min: 1, max: MAX_ELEMENTS, about: 'Shaft elements of the dynamic model; left out to refine automatically.' }, example: 40 },
    shaft_inertia: { shape: { type: 'boolean', about: "Whether the shaft's own inertia is counted." }, example: true },
    dynamic_plasticity: { shape: { type: 'boolean', about: 'Whether the dynamic model caps the torque past yield.' }, example: true },
    damping_ratio: quantity('fraction', 'The damping ratio of the dynamic model.', '2 %'),
    duration: quantity('time', 'The time the dynamic model simulates from the stop.', '300 ms'),
    samples: { shape: { type: 'number', integer: true, min: L.samples[0], max: L.samples[1], about: 'Samples of the uncertainty run through the energy method.' }, example: 10_000 },
    dynamic_samples: { shape: { type: 'number', integer: true, min: L.dynamicSamples[0], max: L.dynamicSamples[1], about: 'Runs of the dynamic model in the uncertainty run.' }, example: 40 },
    seed: { shape: { type: 'number', integer: true, min: L.seed[0], max: L.seed[1], about: 'The random seed of the uncertainty run.' }, example: 42 },
    strength_scatter: quantity('fraction', 'The coefficient of variation of material strengths.', '7 %'),
    design_factor: { shape: { type: 'number', min: L.factor[0], max: L.factor[1], about: 'The design factor the replacement must meet.' }, example: 1.5 },
    service_factor: { shape: { type: 'number', min: L.factor[0], max: L.factor[1], about: 'The service factor on the running torque.' }, example: 1.5 },
    max_scale: { shape: { type: 'number', min: L.factor[0], max: L.factor[1], about: 'The largest practical scale of the diameters.' }, example: 1.3 },
    limiter_at: text('The station where a torque limiter would sit.', 'drive sheave'),
  },
  'Choices of the analysis; each has a default.',
);

export const META_SHAPE = mapping(
  {
    id: text('The incident id.', 'INC-2026-014', true),
    title: text('A one-line title.', 'Granulator jammed on tramp metal'),
    occurred: { shape: { type: 'text', date: true, about: 'When the stop happened (ISO 8601 date or date-time).' }, example: '2026-03-14T06:40' },
    machine: text('The machine.', 'Granulator G-2'),
    asset: text("The machine's asset tag, the same in every case of that machine (the incident log groups by it).", 'GR-4 rotor shaft'),
    site: text('The site.'),
    ticket: text('The maintenance ticket.', 'WO-88412'),
    investigator: text('Who investigated.'),
    notes: text('Notes.'),
  },
  'The incident: its id and the facts around it.',
);

export const CASE_SHAPE = mapping(
  {
    case: { shape: META_SHAPE, required: true },
    units: { shape: { type: 'text', allowed: ['metric', 'us'], about: 'The units the report shows.' }, example: 'metric' },
    speed: { ...quantity('angular_speed', "The shaft's speed at the stop.", '1480 rpm ± 2 %'), required: true },
    stop: { shape: STOP_SHAPE, required: true },
    materials: { shape: { type: 'named', of: MATERIAL_SHAPE, about: "This case's own materials, by the name the case uses; they shadow the library's." } },
    shaft: { shape: SHAFT_SHAPE, required: true },
    stations: { shape: { type: 'list', of: STATION_SHAPE, min: 1, about: 'The stations along the shaft.' }, required: true },
    analysis: { shape: ANALYSIS_SHAPE },
    observed: { shape: OBSERVED_SHAPE },
  },
  'A shaftcase case file: one sudden stop of a rotating machine.',
);

/** The keys of a mapping shape; those of one variant (a part's `shape: disc`) when `variant` is given. */
export function keysOf(shape: Shape, variant?: string): string[] {
  if (shape.type !== 'mapping') throw new Error(`keysOf: a ${shape.type} has no keys`);
  return Object.entries(shape.keys)
    .filter(([, f]) => variant === undefined || !f.when || f.when.values.includes(variant))
    .map(([k]) => k);
}

/** The shape at a field path of a case (`['stations', 2, 'drive', 'torque']`), or undefined where the description has none. */
export function shapeAt(path: Path, root: Shape = CASE_SHAPE): Shape | undefined {
  let s: Shape | undefined = root;
  for (const step of path) {
    if (!s) return undefined;
    if (s.type === 'mapping') s = typeof step === 'string' && Object.hasOwn(s.keys, step) ? s.keys[step].shape : undefined;
    else if (s.type === 'named') s = typeof step === 'string' ? s.of : undefined;
    else if (s.type === 'list') s = typeof step === 'number' ? s.of : undefined;
    else return undefined;
  }
  return s;
}
