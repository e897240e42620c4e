import type { Material } from '../materials/material.ts';
import type { Tolerance } from '../units/quantity.ts';

/**
 * The checked case: everything the engine needs, in SI, with every name resolved. It is the only
 * input the engine accepts; nothing downstream re-reads units or re-checks names.
 *
 * Positions along the shaft are measured from the shaft's start (its first segment's free end), m.
 */
export interface Case {
  meta: CaseMeta;
  /** Units the summary and report show; the JSON is always SI. */
  units: 'metric' | 'us';
  /** Shaft speed at the moment of the stop, rad/s. */
  speed: number;
  stop: Stop;
  /** Every material the case uses, by key (library and case-local). */
  materials: Record<string, Material>;
  shaft: { segments: Segment[] };
  stations: Station[];
  analysis: Analysis;
  /** What was seen afterwards; empty lists when the case records nothing. */
  observed: Observed;
  /** The ± bands stated in the case, by field path (`speed`, `shaft.segments[0].diameter`). */
  tolerances: Record<string, Tolerance>;
  /** The site's materials catalogue the case read (materials.yaml up the tree, or --materials FILE): its name and SHA-256. */
  materialCatalogue?: { file: string; sha256: string };
  /** Where one material definition overrides another (case over site over built-in), in plain words. */
  materialWarnings?: string[];
}

export interface CaseMeta {
  id: string;
  title?: string;
  /** ISO date or date-time, as written. */
  occurred?: string;
  machine?: string;
  /**
   * The plant's tag of the machine (or shaft), the same in every case of it: `shaftcase log` groups
   * incidents by it and adds up their fatigue damage.
   */
  asset?: string;
  site?: string;
  ticket?: string;
  investigator?: string;
  notes?: string;
}

export interface Stop {
  /** Name of the station that stopped. */
  at: string;
  /**
   * Time the stop takes, s; 0 is instantaneous. Over a positive duration the stop station's speed
   * falls linearly to zero, then stays there.
   */
  duration: number;
  /**
   * The most torque the jam can hold, N·m (a soft jam); above it the jam slips with this torque
   * (Coulomb). Absent: the jam holds whatever torque it takes.
   */
  torqueCapacity?: number;
}

export interface Segment {
  /** Index in `shaft.segments` of the case file. */
  index: number;
  label?: string;
  /** Start and end positions, m. */
  start: number;
  end: number;
  /** Outer diameter, m. */
  diameter: number;
  /** Bore diameter, m; 0 for a solid segment. */
  bore: number;
  /** Material key into `Case.materials`. */
  material: string;
  /** Torsional stress-concentration factor at the segment's critical section (1 = none). */
  kt: number;
  /** Slip torque of a friction torque limiter or slip coupling in this segment, N·m. */
  slipTorque?: number;
  /** Torque at which a shear pin or breakaway element in this segment parts, N·m; afterwards it carries nothing. */
  shearTorque?: number;
  /** A coupling in series within this segment (`coupling:`). */
  coupling?: Coupling;
  /** Backlash in this segment (a gear mesh's or a coupling's play), rad: no torque across the gap (`backlash:`). */
  backlash?: number;
  /** The shaft's own material damping in this segment, fraction of critical (`damping_ratio:`); absent: `Analysis.dampingRatio`. */
  dampingRatio?: number;
}

/** A shaft coupling from its data sheet: a spring in series with the segment's own shaft. */
export interface Coupling {
  /** Torsional stiffness, N·m/rad; undefined: rigid (no compliance of its own). */
  stiffness?: number;
  /** Rated (nominal) torque, N·m. */
  ratedTorque: number;
  /** The most torque it may take now and then (the maker's maximum or peak torque), N·m; undefined: not given. */
  peakTorque?: number;
  /**
   * Its damping as a fraction of critical, from its data sheet (`damping_ratio:`); absent:
   * `Analysis.dampingRatio`. What it means in the dynamic model: see `elementDampers`
   * (src/results/element-damping.ts).
   */
  dampingRatio?: number;
}

export interface Station {
  name: string;
  /** Position, m. */
  at: number;
  parts: Part[];
  /** The motor that drives the shaft at this station (`drive:`), if any. */
  drive?: Drive;
  /** The key that holds this station's hub on the shaft (`key:`), where the case gives one. */
  key?: ShaftKey;
  /** The shrink or press fit that holds this station's hub on the shaft (`fit:`), where the case gives one. */
  fit?: HubFit;
  /** The gear unit whose output is this station's shaft (`gearbox:`), where the case gives one. */
  gearbox?: Gearbox;
  /** A backstop (one-way clutch) at this station (`backstop: true`): the shaft here cannot turn backwards. */
  backstop?: Backstop;
}

/**
 * A gear unit whose output shaft is the station's shaft. Its input is the motor side: the drive's
 * rotor and the station's parts that turn at the ratio (their inertia is reflected as J·ratio², as
 * for any geared part). Torques are at the output unless named otherwise.
 */
export interface Gearbox {
  /** Input speed over output speed (the nameplate's ratio), > 0. */
  ratio: number;
  /** Rated output torque, N·m: a gearmotor's nameplate output torque (at the motor's rated power), or a bare unit's catalogue rating. */
  ratedOutputTorque: number;
  /** Service factor fB (the gear unit's rating over that output torque); the unit is checked against ratedOutputTorque × serviceFactor, its own rating. Default 1. */
  serviceFactor: number;
  /** Forward efficiency, (0, 1]: the torque passed from input to output is multiplied by it. Default 1. */
  efficiency: number;
  /** false for a self-locking worm: the load side cannot turn the motor side backwards. Default true. */
  backDrivable: boolean;
  /** The output gear's teeth (on the station's shaft), where the case gives them: module, m; face width, m; tooth count. */
  outputGear?: { module: number; faceWidth: number; teeth: number };
}

/** A backstop (holdback, one-way clutch): the station's shaft cannot turn backwards. */
export interface Backstop {
  /** Rated torque, N·m (catalogue), where given. */
  ratedTorque?: number;
}

/**
 * A shrink or press fit of the station's hub on the shaft. The seat's diameter, the shaft's bore
 * and the shaft's material are the shaft's at the station (the segment toward the stop where the
 * station stands on a shoulder).
 */
export interface HubFit {
  /** Diametral interference, m: the shaft's diameter less the hub's bore before assembly. */
  interference: number;
  /** The hub's outer diameter over the seat, m. */
  hubOuterDiameter: number;
  /** Length of the fit along the shaft, m. */
  length: number;
  /** Coefficient of friction at the seat. */
  friction: number;
  /** The hub's material key into `Case.materials`; it has an elastic modulus and Poisson's ratio. */
  hubMaterial: string;
}

/** A parallel key (square or rectangular) between a hub and the shaft (Shigley 9th ed. Sec. 7-7). */
export interface ShaftKey {
  /** Width w, m (across the shaft). */
  width: number;
  /** Height h, m (radial). */
  height: number;
  /** Engaged length l, m (along the shaft). */
  length: number;
  /** Material key into `Case.materials`; it has a yield strength. */
  material: string;
  /**
   * Radial height of the key that bears on the hub, m (the key's projection above the shaft, h − t1
   * for a DIN 6885 keyway). Absent: half the key's height bears on each side (the h/2 rule).
   */
  hubDepth?: number;
}

/**
 * A motor driving the shaft at a station, directly, through gears or through a belt. Torques and
 * speeds of the motor itself are at the motor's shaft; the model reflects them through
 * `speedRatio` (torque × ratio, speed ÷ ratio at the machine shaft).
 *
 * The rotor's inertia is one of the station's parts, listed once: either a part in `parts` (at the
 * drive's speed ratio) or `drive.rotor_inertia` in the case file, which the reader adds to `parts`
 * as a part named "motor rotor". Giving both is refused as a double entry.
 */
export interface Drive {
  /** Motor speed over shaft speed (belt or gear ratio); 1 for a motor coupled to the shaft. */
  speedRatio: number;
  /** Indices into the station's `parts` that make up the motor's rotor (behind the belt, if any). */
  rotorParts: number[];
  /** Rated power, W, as given (read by the resizing work; the dynamics do not use it unless nothing else gives the torque). */
  power?: number;
  /** Normal running torque at the motor shaft, N·m, as given. */
  runningTorque?: number;
  /** The motor's torque while it is pulled down, at the motor shaft; absent: see the dynamic model's assumptions. */
  torque?: MotorTorqueSpec;
  /** A belt between the motor and this station's pulley, which can slip. */
  belt?: BeltSpec;
  /** Time from the stop after which the drive or the motor's overload cuts the torque, s (`trip_after`). */
  tripAfter?: number;
  /** Most torque the drive lets the motor give, at the motor shaft, N·m (`torque_limit`: a drive's current limit). */
  torqueLimit?: number;
}

/** A constant torque, or a speed–torque curve by points (motor speed rad/s, torque N·m), speeds rising from 0. */
export type MotorTorqueSpec = { kind: 'constant'; torque: number } | { kind: 'curve'; points: { speed: number; torque: number }[] };

/**
 * A belt drive's slip limit: a stated slip torque at this station's shaft, N·m, or belt data from
 * which the capstan relation gives it (wrap angle on the pulley that slips first, rad; coefficient
 * of friction; V-groove included angle, rad; belt tension, N, all belts together; diameter of the
 * pulley on this station's shaft, m).
 */
export type BeltSpec =
  | { kind: 'slip torque'; slipTorque: number }
  | {
      kind: 'capstan';
      wrapAngle: number;
      friction: number;
      grooveAngle?: number;
      tension: number;
      tensionIs: 'installed' | 'tight side';
      pulleyDiameter: number;
    };

export type PartShape = 'disc' | 'inertia' | 'mass';

export interface Part {
  name: string;
  shape: PartShape;
  /** Polar mass moment of inertia of one part about its own axis, kg·m². */
  inertia: number;
  /** How many identical parts. */
  count: number;
  /** The part's speed over the shaft's speed (belt or gear ratio); 1 for a part on the shaft. */
  speedRatio: number;
  /** The shape's dimensions as given, SI, for the report. */
  dimensions: Record<string, number>;
  /** Material key, where the part's density came from a material. */
  material?: string;
  /** The highest speed marked on the part (abrasive or cutting wheel), rad/s of the part itself. */
  ratedSpeed?: number;
}

export type YieldCriterion = 'distortion-energy' | 'max-shear';

/** Past yield: elastic–perfectly plastic (`none`, the default) or linear strain hardening from S_y, S_ut and elongation. */
export type Hardening = 'none' | 'linear';

export interface Analysis {
  criterion: YieldCriterion;
  hardening: Hardening;
  /** Monte Carlo settings; the uncertainty run happens when the case states a tolerance or a strength scatter. */
  uncertainty: {
    /** Whether the case asks for it (any ± tolerance, or analysis.strength_scatter given). */
    wanted: boolean;
    /** Number of samples (default 10 000). */
    samples: number;
    /** Seed of the generator (default 1), recorded with the results. */
    seed: number;
    /** Coefficient of variation of material strengths, fraction (default 0.07). */
    strengthScatter: number;
    /**
     * Samples through the dynamic model where the verdict stands on it (default 40, 0: none). Each
     * costs a full time solution, so the count is small and stated with the result.
     */
    dynamicSamples: number;
  };
  /** Design factor N on shear yield a replacement must keep under a repeat of the incident; default 1.5. */
  designFactor: number;
  /** Service factor on the running torque for a torque limiter's lowest setting; default 1.5. */
  serviceFactor: number;
  /** Largest scale of the shaft's diameters taken as practical (bearings, hubs); default 1.3. */
  maxScale: number;
  /** Station where a torque limiter would sit; absent: the rule in src/resize/torque-limiter.ts. */
  limiterAt?: string;
  /** Shaft elements in the dynamic model; absent: refined automatically. */
  elements?: number;
  /** Whether the dynamic model carries the shaft's own inertia (default true). */
  shaftInertia: boolean;
  /** Whether the dynamic model's shaft elements yield (elastic–plastic law); absent: `DEFAULT_DYNAMIC_PLASTICITY`. */
  dynamicPlasticity?: boolean;
  /** Damping ratio of each side's lowest mode, stiffness-proportional (default `DEFAULT_DAMPING_RATIO`). */
  dampingRatio: number;
  /** Simulated time from the stop, s; absent: chosen from the lowest mode and the drive. */
  duration?: number;
}

/**
 * Default damping ratio of the dynamic model: 0.5 % of critical in each side's lowest mode,
 * stiffness-proportional. A small value typical of steel shafting: the material damping of steel
 * is a fraction of a percent, and keyed hubs, couplings and bearings add to it, up to the few
 * percent quoted for whole drive lines (from memory, verify). The low end is taken so that the
 * first peak (lowered by about ζ·π/2) and the ringing are not understated.
 */
export const DEFAULT_DAMPING_RATIO = 0.005;
/** Whether the dynamic model's shaft elements yield unless `analysis.dynamic_plasticity` says otherwise. */
export const DEFAULT_DYNAMIC_PLASTICITY = true;

/** What the investigator saw after the incident (`observed:` in the case file). */
export interface Observed {
  /** Permanent angular offsets measured between two stations. */
  permanentTwist: TwistMeasurement[];
  fracture?: FractureObservation;
  /** Free text about the key (sheared, rolled, intact). */
  key?: string;
  /** Free text about hubs (slipped, cracked). */
  hub?: string;
  /** Anything else seen. */
  other?: string;
  /** General notes. */
  notes?: string;
  photos: Photo[];
}

export interface TwistMeasurement {
  /** The two station names the offset was measured between. */
  between: [string, string];
  /** Measured permanent offset, rad (non-negative). */
  angle: number;
  /** How it was measured, free text. */
  method?: string;
}

export type FractureType = 'none' | 'transverse' | 'helical' | 'fatigue' | 'unknown';

export interface FractureObservation {
  type: FractureType;
  /** Station name, or a position in m, where it broke. */
  at?: string | number;
  notes?: string;
}

export interface Photo {
  /** Path relative to the case folder; checked to stay inside it. */
  path: string;
  caption?: string;
}
