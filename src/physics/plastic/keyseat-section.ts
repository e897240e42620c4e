// The fully plastic torque of a keyed seat's net section: a round shaft (solid or hollow) less a
// keyseat, a rectangle of width w and depth t cut into its surface.
//
// Why the sand heap. In fully plastic torsion the stress function φ (τ_xz = ∂φ/∂y, τ_yz = −∂φ/∂x)
// has the steepest slope the yield condition allows, |∇φ| = τ_Y, with φ = 0 on the outer contour
// and φ constant on a bore, and the torque is T = 2∫φ dA (+ 2φ_i·A_bore for a bore). φ is then the
// heap of sand the section would hold: τ_Y times the distance to the nearest outer boundary
// (Nadai's sand-heap analogy: A. Nadai, Theory of Flow and Fracture of Solids, vol. 1, 1950,
// ch. on plastic torsion; also Hill, The Mathematical Theory of Plasticity, 1950, ch. VIII; from
// memory, confident). The keyseat takes the heap over itself and lowers it wherever the keyseat's
// walls or floor are nearer than the shaft's surface, which reaches to the centre (the heap's top
// drops from R to R − t). With a bore, φ on the bore is the largest constant the slope allows,
// φ_i = R − t − c₁ (the floor's distance to the bore), and φ = min(τ_Y·d_net, φ_i + τ_Y·(r − c₁))
// in the material (the largest function of slope τ_Y with those boundary values). For a plain round
// section this gives T_P = (2π/3)·τ_Y·(c₂³ − c₁³) exactly (REFERENCE 3.1.5, 3.2.2).
//
// Why not a simpler net section. The equivalent diameter d − t takes some 30 % off a DIN 6885 seat
// (far too low); τ_Y·∫r dA over the net section (every fibre at τ_Y round the axis) is an upper
// bound by the kinematic theorem that overstates it by some 5 %; the sand heap lies between them,
// about 10 % below the gross section for standard keys. The heap is integrated numerically here
// (midpoint rule on a polar grid, the gross section on the same grid, so the ratio carries
// little of the grid's error: within 1e-4 of a fine Cartesian grid, test/physics/plastic/keyseat-section.test.ts).

/** A keyseat in a round section, m: outer diameter, bore (0: solid), keyseat width and depth in the shaft. */
export interface KeyseatSection {
  diameter: number;
  bore: number;
  width: number;
  depth: number;
}

const RADIAL = 64;
const ANGULAR = 128;

/**
 * T_P of the net section over T_P of the gross round section, 0 to 1 (1 without a keyseat; 0 where
 * the keyseat cuts through to the bore).
 */
export function keyseatPlasticRatio(s: KeyseatSection): number {
  if (!(s.width > 0 && s.depth > 0)) return 1;
  // The ratio depends on the proportions only; a Monte Carlo run that varies the diameter by its
  // tolerance asks for nearly the same ones thousands of times. They are taken to 4 digits (a
  // change of 1 in the 4th digit moves the ratio by some 1e-5, inside the integration's own 1e-4)
  // and the section of those rounded proportions is integrated, so the value is a function of the
  // rounded proportions alone, whatever was asked before, and is kept.
  const bore = fourFigures(s.bore / s.diameter);
  const width = fourFigures(s.width / s.diameter);
  const depth = fourFigures(s.depth / s.diameter);
  // One number for the three: each code is below 2·10⁵, so three in base 2·10⁵ stay below 2⁵³ (exact).
  const key = (bore.code * CODE_BASE + width.code) * CODE_BASE + depth.code;
  const known = KNOWN.get(key);
  if (known !== undefined) return known;
  if (KNOWN.size >= MAX_KNOWN) KNOWN.clear();
  const ratio = integrate({ diameter: 1, bore: bore.value, width: width.value, depth: depth.value });
  KNOWN.set(key, ratio);
  return ratio;
}

const KNOWN = new Map<number, number>();
const MAX_KNOWN = 4096;
const CODE_BASE = 200_000;

/**
 * x ≥ 0 to 4 significant figures, m·10^k with m a whole number 1000–9999: its value (the double
 * nearest m·10^k, as \`Number(x.toPrecision(4))\` reads it; one correctly rounded product or
 * quotient of exact numbers gives that double) and a code 20·m + k + 10 that names it (k within
 * −13…6, which any proportion of a shaft section is). Without strings: a Monte Carlo run asks
 * thousands of times.
 */
export function fourFigures(x: number): { value: number; code: number } {
  if (!(x > 0)) return { value: 0, code: 0 };
  let k = Math.floor(Math.log10(x)) - 3;
  const scaled = (p: number) => (p >= 0 ? x / 10 ** p : x * 10 ** -p);
  let s = scaled(k);
  // Math.log10 may miss the decade by one next to a power of ten.
  if (s >= 10000) s = scaled(++k);
  else if (s < 1000) s = scaled(--k);
  // Within rounding of a tie the scaled product cannot tell which way the exact value lies:
  // there, and there only, the decimal conversion decides.
  let m = Math.abs(s - Math.floor(s) - 0.5) < 1e-7 ? Math.round(Number(x.toPrecision(4)) / 10 ** k) : Math.round(s);
  if (m === 10000) {
    m = 1000;
    k += 1;
  }
  const value = k >= 0 ? m * 10 ** k : m / 10 ** -k;
  return { value, code: 20 * m + Math.max(-10, Math.min(9, k + 3)) + 10 };
}

function integrate(s: KeyseatSection): number {
  const R = s.diameter / 2;
  const c1 = s.bore / 2;
  const halfW = s.width / 2;
  const t = s.depth;
  const floor = R - t;
  if (floor <= c1 || halfW >= R) return 0;
  const phiBore = floor - c1;
  const dr = (R - c1) / RADIAL;
  const dth = Math.PI / ANGULAR;
  let net = 0;
  let gross = 0;
  // Half the section (x ≥ 0, θ from the keyseat's axis); the factor 2 cancels in the ratio.
  for (let i = 0; i < RADIAL; i++) {
    const r = c1 + (i + 0.5) * dr;
    const toSurface = R - r;
    const cell = r * dr * dth;
    for (let j = 0; j < ANGULAR; j++) {
      const th = (j + 0.5) * dth;
      const x = r * Math.sin(th);
      const y = r * Math.cos(th);
      gross += toSurface * cell;
      if (x <= halfW && y >= floor) continue; // in the keyseat
      const dx = Math.max(0, x - halfW);
      const dy = Math.max(0, floor - y);
      const toKeyseat = Math.sqrt(dx * dx + dy * dy);
      net += Math.min(toSurface, toKeyseat, phiBore + (r - c1)) * cell;
    }
  }
  // The bore's plateau: φ_i over the bore's area, against R − c₁ for the gross section.
  const boreArea = (Math.PI * c1 * c1) / 2;
  return (net + phiBore * boreArea) / (gross + (R - c1) * boreArea);
}

/** The keyseat's depth in the shaft, m: the key's height less its part in the hub, else half its height (the h/2 rule of the bearing check). */
export function keyseatDepth(key: { height: number; hubDepth?: number }): number {
  return key.hubDepth !== undefined ? key.height - key.hubDepth : key.height / 2;
}
