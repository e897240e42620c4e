import type { QuantityKind } from '../units/unit-table.ts';

/**
 * The broad physical limits a case file's values must keep, checked by `CaseReader` at the
 * boundary so that no NaN or Infinity can come out of the engine. They are far wider than any
 * machine this tool is for (the plausibility checks, src/case/plausibility.ts, warn much earlier);
 * their job is to refuse a number that parses but is absurd (1e308 rpm, a 1e-300 m diameter)
 * before a stiffness, an inertia or a time step overflows or underflows. Listed in the README,
 * "Limits". A zero, where a field allows it, is not held to the lower limit.
 */
export interface Limit {
  /** Smallest magnitude allowed other than zero, SI. */
  min: number;
  /** Largest magnitude allowed, SI. */
  max: number;
  /** The range as a reader writes it, for messages: "0.1 mm to 100 m". */
  text: string;
}

const RPM = (2 * Math.PI) / 60;

/** Default limits per kind of quantity, SI. */
export const KIND_LIMITS: Record<QuantityKind, Limit> = {
  length: { min: 1e-4, max: 100, text: '0.1 mm to 100 m' },
  // The fastest rotors made (dental turbines, small turbomachinery) run below 500 000 rpm.
  angular_speed: { min: 0.01 * RPM, max: 500_000 * RPM, text: '0.01 rpm to 500 000 rpm' },
  // Strengths; the moduli have their own (MODULUS_LIMIT).
  stress: { min: 1e6, max: 5e9, text: '1 MPa to 5 GPa' },
  density: { min: 100, max: 25_000, text: '100 kg/m^3 to 25 000 kg/m^3' },
  inertia: { min: 1e-9, max: 1e7, text: '1e-9 kg*m^2 to 1e7 kg*m^2' },
  angle: { min: 1e-6, max: 20 * Math.PI, text: '0.0001 deg to 10 rev' },
  time: { min: 1e-6, max: 10, text: '1 us to 10 s' },
  mass: { min: 1e-3, max: 1e6, text: '1 g to 1000 t' },
  torque: { min: 1e-3, max: 1e9, text: '0.001 N*m to 1e9 N*m' },
  power: { min: 1, max: 1e9, text: '1 W to 1 GW' },
  energy: { min: 1e-3, max: 1e10, text: '0.001 J to 1e10 J' },
  force: { min: 1e-2, max: 1e8, text: '0.01 N to 1e8 N' },
  stiffness: { min: 1, max: 1e12, text: '1 N*m/rad to 1e12 N*m/rad' },
  fraction: { min: 1e-6, max: 1, text: '0.0001 % to 100 %' },
};

/** Shear and elastic moduli: soft plastics to tungsten carbide. */
export const MODULUS_LIMIT: Limit = { min: 1e8, max: 1e12, text: '0.1 GPa to 1000 GPa' };

/** Elongation at break: more than none, at most 100 % (a material that more than doubles its length in a tensile test is no shaft material). */
export const ELONGATION_LIMIT: Limit = { min: 1e-4, max: 1, text: '0.01 % to 100 %' };

/** Reduction of area: strictly below 100 % (at 100 % the fracture strain √3·ln(1/(1−RA)) is infinite). */
export const REDUCTION_OF_AREA_LIMIT: Limit = { min: 1e-4, max: 0.99, text: '0.01 % to 99 %' };

/** A fracture shear strain as a plain number: above zero, at most 10 (pure copper in torsion reaches about 5). */
export const FRACTURE_STRAIN_LIMIT: Limit = { min: 1e-4, max: 10, text: '0.0001 to 10' };

/**
 * The strain–life constants as plain numbers, [min, max]: wide bands about the published values of
 * metals (n′ 0.05–0.3, b −0.05 to −0.15, c −0.4 to −0.9, ε′_f 0.05–2 in Dowling, 4th ed., Table
 * 14.1; from memory); K′ and σ′_f are strengths (1 MPa to 5 GPa).
 */
export const CYCLIC_LIMITS = {
  cyclic_hardening_exponent: [0.01, 0.6],
  fatigue_strength_exponent: [-0.3, -0.01],
  fatigue_ductility_coefficient: [0.001, 10],
  fatigue_ductility_exponent: [-1.5, -0.1],
} as const;

/** Limits of the plain numbers: [min, max]. */
/** More shaft elements than this buy nothing a case file can measure and make `check` slow. */
export const MAX_ELEMENTS = 2000;

export const NUMBER_LIMITS = {
  kt: [1, 10],
  speedRatio: [0.001, 1000],
  count: [1, 10_000],
  friction: [0.001, 2],
  /** A gear unit's efficiency, (0, 1]: at least 0.01 (0 would pass no torque; a self-locking worm still passes some 30 % forward), at most 1. */
  efficiency: [0.01, 1],
  factor: [1, 10],
  samples: [1, 100_000],
  dynamicSamples: [0, 1000],
  seed: [0, 2 ** 32 - 1],
} as const satisfies Record<string, readonly [number, number]>;

/** Sizes of the case: checked before any work starts. */
export const SIZE_LIMITS = {
  /** Case file size, bytes. */
  fileBytes: 1_000_000,
  /** Colons in the whole file: a bound on its keys checked before it is parsed. */
  keysPerFile: 20_000,
  /** Keys in one YAML mapping. */
  keysPerMapping: 1000,
  /** Shaft segments. */
  segments: 200,
  /** Stations. */
  stations: 200,
  /** Parts on one station. */
  partsPerStation: 100,
  /** Points of a motor curve. */
  curvePoints: 200,
  /** Measured twists, photos. */
  listItems: 200,
  /** One photo, bytes: the HTML carries each photo inside it, so a camera's full-size file is refused. */
  photoBytes: 15_000_000,
  /** All the photos of a case together, bytes. */
  photosBytes: 60_000_000,
} as const;
