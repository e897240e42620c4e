import type { Case } from '../case/case.ts';
import { partInertia } from '../physics/inertia.ts';
import type { Tolerance } from '../units/quantity.ts';

/**
 * How an uncertain input is drawn. A stated ± band is two standard deviations of a normal
 * distribution (the band covers about 95 % of what a careful measurement would read); a handbook
 * minimum strength is the 5th percentile of a normal with the stated coefficient of variation, so
 * the real bar is probably stronger; a typical strength is the mean.
 */
export type Spread = { kind: 'normal'; mean: number; sd: number };

/** `band`: a stated ± band (2σ of a normal); `minimum` / `typical`: a library or case strength by its basis. */
export type SpreadBasis = 'band' | 'minimum' | 'typical';

/** One input the Monte Carlo varies: where it is in the case file, its spread, and how to set it. */
export interface UncertainInput {
  /** Field path as in the case file (`speed`, `shaft.segments[1].diameter`, `materials.aisi-1045-cd.yield_strength`). */
  path: string;
  /** The value the single run uses, SI. */
  nominal: number;
  spread: Spread;
  /** How the spread was chosen: a stated ± band, or a material strength by its basis. */
  basis: SpreadBasis;
  /** A new case with this input set to `value`; the input case is not changed. */
  apply: (c: Case, value: number) => Case;
  /** Sets this input to `value` in `c` itself (a `sampleCopy`, made once for many samples). */
  set: (c: Case, value: number) => void;
}

/** z of the 5th percentile of the standard normal. */
const Z95 = 1.6448536269514722;

/** Half the ± band, as an SI standard deviation: band = 2σ. */
export function sdOfTolerance(t: Tolerance, nominal: number): number {
  return (t.kind === 'relative' ? t.fraction * Math.abs(nominal) : t.value) / 2;
}

/** Spread of a material strength by its basis, with coefficient of variation `cov`. */
export function strengthSpread(value: number, basis: 'minimum' | 'typical', cov: number): Spread {
  if (basis === 'typical') return { kind: 'normal', mean: value, sd: cov * value };
  const mean = value / (1 - Z95 * cov);
  return { kind: 'normal', mean, sd: cov * mean };
}

const SEGMENT = /^shaft\.segments\[(\d+)\]\.(diameter|bore)$/;
const PART = /^stations\[(\d+)\]\.parts\[(\d+)\]\.(diameter|thickness|bore|density|mass|radius_of_gyration|inertia)$/;
const MEASURED = /^observed\.permanent_twist\[(\d+)\]\.angle$/;
const MATERIAL = /^materials\.(.+)\.(shear_modulus|yield_strength|tensile_strength|density)$/;
const MATERIAL_PROPS = { shear_modulus: 'shearModulus', yield_strength: 'yieldStrength', tensile_strength: 'tensileStrength', density: 'density' } as const;

/**
 * A copy of the case whose drawn fields can be set in place: the speed, segments, parts, materials
 * and measured twists are copied, the rest is shared. The Monte Carlo makes one per case and sets
 * every drawn input in it for each sample (`UncertainInput.set`), rather than a case per input.
 */
export function sampleCopy(c: Case): Case {
  return {
    ...c,
    shaft: { ...c.shaft, segments: c.shaft.segments.map((s) => ({ ...s })) },
    stations: c.stations.map((s) => ({ ...s, parts: s.parts.map((p) => ({ ...p, dimensions: { ...p.dimensions } })) })),
    materials: Object.fromEntries(Object.entries(c.materials).map(([k, m]) => [k, { ...m }])),
    observed: { ...c.observed, permanentTwist: c.observed.permanentTwist.map((t) => ({ ...t })) },
  };
}

/** The in-place setter for a field path, or undefined when the Monte Carlo does not vary that field. */
function setterFor(c: Case, path: string): { nominal: number; set: UncertainInput['set'] } | undefined {
  if (path === 'speed') {
    return {
      nominal: c.speed,
      set: (k, v) => {
        k.speed = v;
      },
    };
  }
  let m = SEGMENT.exec(path);
  if (m) {
    const index = Number(m[1]);
    const field = m[2] as 'diameter' | 'bore';
    const seg = c.shaft.segments.find((s) => s.index === index);
    if (!seg) return undefined;
    return {
      nominal: seg[field],
      set: (k, v) => {
        for (const s of k.shaft.segments) if (s.index === index) s[field] = v;
      },
    };
  }
  m = PART.exec(path);
  if (m) {
    const [si, pi, field] = [Number(m[1]), Number(m[2]), m[3]];
    const part = c.stations[si]?.parts[pi];
    if (!part || part.dimensions[field] === undefined) return undefined;
    return {
      nominal: part.dimensions[field],
      set: (k, v) => {
        const p = k.stations[si].parts[pi];
        p.dimensions[field] = v;
        // The inertia follows its dimensions, as the case reader computed it.
        p.inertia = partInertia(p.shape, p.dimensions);
      },
    };
  }
  m = MEASURED.exec(path);
  if (m) {
    const i = Number(m[1]);
    const t = c.observed.permanentTwist[i];
    if (!t) return undefined;
    return {
      nominal: t.angle,
      set: (k, v) => {
        k.observed.permanentTwist[i].angle = v;
      },
    };
  }
  m = MATERIAL.exec(path);
  if (m) {
    const [key, field] = [m[1], m[2] as keyof typeof MATERIAL_PROPS];
    const prop = MATERIAL_PROPS[field];
    const mat = c.materials[key];
    if (!mat || mat[prop] === undefined) return undefined;
    return {
      nominal: mat[prop]!,
      set: (k, v) => {
        k.materials[key][prop] = v;
      },
    };
  }
  return undefined;
}

/** An input with its setter, and `apply` on a copy of the case. */
function withApply(s: { nominal: number; set: UncertainInput['set'] }): { nominal: number; set: UncertainInput['set']; apply: UncertainInput['apply'] } {
  return {
    ...s,
    apply: (k, v) => {
      const w = sampleCopy(k);
      s.set(w, v);
      return w;
    },
  };
}

/**
 * The inputs a Monte Carlo varies: every field with a stated tolerance that it knows how to set,
 * and the yield strength of every shaft material by its strength basis (unless `strengthScatter`
 * is 0); a case material that states no basis is taken as typical (a certificate value). Tolerances on fields it cannot vary (lengths, positions) are returned in `notVaried`.
 */
export function uncertainInputs(c: Case, strengthScatter: number): { inputs: UncertainInput[]; notVaried: string[] } {
  const inputs: UncertainInput[] = [];
  const notVaried: string[] = [];
  for (const [path, tol] of Object.entries(c.tolerances)) {
    const s = setterFor(c, path);
    if (!s) {
      notVaried.push(path);
      continue;
    }
    inputs.push({ path, ...withApply(s), basis: 'band', spread: { kind: 'normal', mean: s.nominal, sd: sdOfTolerance(tol, s.nominal) } });
  }
  if (strengthScatter > 0) {
    const shaftMaterials = new Set(c.shaft.segments.map((s) => s.material));
    for (const key of shaftMaterials) {
      const path = `materials.${key}.yield_strength`;
      if (inputs.some((i) => i.path === path)) continue;
      const mat = c.materials[key];
      const s = setterFor(c, path)!;
      const basis = mat.strengthBasis ?? 'typical';
      inputs.push({ path, ...withApply(s), basis, spread: strengthSpread(mat.yieldStrength!, basis, strengthScatter) });
    }
  }
  return { inputs, notVaried };
}
