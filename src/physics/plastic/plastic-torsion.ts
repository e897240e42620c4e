// Elastic–plastic torsion of a round section, solid or hollow: shear stress τ = G·γ up to the
// shear yield τ_Y, then τ = τ_Y + H·(γ − γ_Y) (H = 0: elastic–perfectly plastic), γ = r·φ with φ
// the twist per length. Beer & Johnston, Mechanics of Materials, Sec. 3.9–3.11 (elastoplastic
// shafts, residual stresses) and Hibbeler, Mechanics of Materials, Sec. 5.9–5.10 (from memory,
// confident); the hollow and hardening forms are derived here by integrating τ·r over the
// section (shared REFERENCE.md 3.2.4). Unloading is elastic (no reverse yield, no Bauschinger
// effect). Stress-concentration factors are not applied: this is the net section's behaviour.

/** The torque–twist law of one round section, SI. */
export interface TorsionLaw {
  /** Outer radius c₂, m. */
  outerRadius: number;
  /** Bore radius c₁, m; 0 for a solid section. */
  innerRadius: number;
  /** Shear modulus G, Pa. */
  shearModulus: number;
  /** Shear yield τ_Y, Pa; Infinity for a section that stays elastic (a brittle material). */
  shearYield: number;
  /** Linear hardening slope dτ/dγ past yield, Pa; 0 for elastic–perfectly plastic. */
  hardeningModulus: number;
}

// Plain products rather than `**`: these run in the Monte Carlo's inner loop (npm run bench).
const fourth = (x: number) => {
  const x2 = x * x;
  return x2 * x2;
};
const polar = (l: TorsionLaw) => (Math.PI / 2) * (fourth(l.outerRadius) - fourth(l.innerRadius));
const yieldStrain = (l: TorsionLaw) => l.shearYield / l.shearModulus;

/** Elastic torsional rigidity G·J_p, N·m². */
export function rigidity(l: TorsionLaw): number {
  return l.shearModulus * polar(l);
}

/** Torque at first yield of the outer fibre, T_Y = τ_Y·J_p/c₂, N·m (REFERENCE 3.1.1, 3.2.1). */
export function yieldTorque(l: TorsionLaw): number {
  return (l.shearYield * polar(l)) / l.outerRadius;
}

/** Twist per length at first yield, φ_Y = τ_Y/(G·c₂), rad/m (REFERENCE 3.1.2). */
export function yieldTwistRate(l: TorsionLaw): number {
  return yieldStrain(l) / l.outerRadius;
}

/**
 * Fully plastic torque T_P = (2π/3)·τ_Y·(c₂³ − c₁³), N·m (REFERENCE 3.1.5, 3.2.2): 4/3 of T_Y for
 * a solid bar. It is the limit of an elastic–perfectly plastic section; a hardening one rises past it.
 */
export function plasticTorque(l: TorsionLaw): number {
  return ((2 * Math.PI) / 3) * l.shearYield * (l.outerRadius ** 3 - l.innerRadius ** 3);
}

/** Radius inside which the section is still elastic at twist rate φ, m (c₂ while elastic, c₁ or less once fully plastic). */
function coreRadius(l: TorsionLaw, phi: number): number {
  return Math.min(l.outerRadius, yieldStrain(l) / phi);
}

/**
 * Torque at twist per length φ ≥ 0, N·m. Elastic core of radius ρ = γ_Y/φ, plastic rim outside:
 * T = 2π[∫ Gφr³ dr over the core + ∫ (τ_Y + H(rφ − γ_Y))r² dr over the rim]. For a solid bar and
 * H = 0 this is T = (4/3)T_Y[1 − ¼(φ_Y/φ)³] (REFERENCE 3.1.4).
 */
export function torqueAtTwistRate(l: TorsionLaw, phi: number): number {
  const { outerRadius: c2, innerRadius: c1, shearModulus: g, hardeningModulus: h } = l;
  const gy = l.shearYield / g;
  const rho = Math.min(c2, gy / phi);
  const c2sq = c2 * c2;
  const c14 = c1 * c1 * c1 * c1;
  if (rho >= c2) return (Math.PI / 2) * g * (c2sq * c2sq - c14) * phi;
  const a = rho > c1 ? rho : c1;
  const a3 = a * a * a;
  const c23 = c2sq * c2;
  const core = rho > c1 ? (Math.PI / 2) * g * phi * (a3 * a - c14) : 0;
  const rim = ((2 * Math.PI) / 3) * l.shearYield * (c23 - a3);
  const hardening = h > 0 ? 2 * Math.PI * h * ((phi * (c2sq * c2sq - a3 * a)) / 4 - (gy * (c23 - a3)) / 3) : 0;
  return core + rim + hardening;
}

/**
 * Strain energy absorbed per length up to twist rate φ, J/m: the work ∫T dφ, done here as the
 * section integral of the strain-energy density w(γ) = ∫τ dγ (REFERENCE 3.1.9 for the solid,
 * perfectly plastic case: U = T_Yθ_Y[½ + (4/3)(u − 9/8 + 1/(8u²))], u = θ/θ_Y).
 */
export function energyPerLength(l: TorsionLaw, phi: number): number {
  const { outerRadius: c2, innerRadius: c1, shearModulus: g, hardeningModulus: h } = l;
  const gy = yieldStrain(l);
  const rho = coreRadius(l, phi);
  if (rho >= c2) return 0.5 * g * polar(l) * phi ** 2;
  const a = Math.max(rho, c1);
  const core = rho > c1 ? (Math.PI / 4) * g * phi ** 2 * (a ** 4 - c1 ** 4) : 0;
  // w = τ_Y(γ − γ_Y/2) + H(γ − γ_Y)²/2 in the rim.
  const rim = 2 * Math.PI * l.shearYield * ((phi * (c2 ** 3 - a ** 3)) / 3 - (gy * (c2 ** 2 - a ** 2)) / 4);
  const hardening = h > 0 ? Math.PI * h * ((phi ** 2 * (c2 ** 4 - a ** 4)) / 4 - (2 * phi * gy * (c2 ** 3 - a ** 3)) / 3 + (gy ** 2 * (c2 ** 2 - a ** 2)) / 2) : 0;
  return core + rim + hardening;
}

/**
 * Twist per length at which the section carries torque T, rad/m: the inverse of
 * `torqueAtTwistRate`. Closed form while elastic and for a solid perfectly plastic bar
 * (φ = φ_Y/(4(1 − T/T_P))^⅓); otherwise a bracketed bisection. Infinity at or above T_P of a
 * perfectly plastic section (it twists without limit there).
 */
export function twistRateAtTorque(l: TorsionLaw, torque: number): number {
  if (torque <= yieldTorque(l)) return torque / rigidity(l);
  const tp = plasticTorque(l);
  if (l.hardeningModulus === 0) {
    if (torque >= tp) return Infinity;
    if (l.innerRadius === 0) return yieldTwistRate(l) / Math.cbrt(4 * (1 - torque / tp));
  }
  let lo = yieldTwistRate(l);
  let hi = 2 * lo;
  while (torqueAtTwistRate(l, hi) < torque) {
    lo = hi;
    hi *= 2;
  }
  for (let i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (torqueAtTwistRate(l, mid) < torque) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * Twist per length left after unloading elastically from twist rate φ, rad/m:
 * φ_p = φ − T(φ)/(G·J_p), zero while elastic (REFERENCE 3.1.6).
 */
export function residualTwistRate(l: TorsionLaw, phi: number): number {
  if (phi <= yieldTwistRate(l)) return 0;
  return Math.max(0, phi - torqueAtTwistRate(l, phi) / rigidity(l));
}

/**
 * Residual shear stress at the outer fibre after elastic unloading from φ, Pa:
 * τ(c₂) − T·c₂/J_p (REFERENCE 3.1.7). Below −τ_Y the unloading itself would yield in reverse.
 */
export function residualSurfaceStress(l: TorsionLaw, phi: number): number {
  const gamma = l.outerRadius * phi;
  const gy = yieldStrain(l);
  const tau = gamma <= gy ? l.shearModulus * gamma : l.shearYield + l.hardeningModulus * (gamma - gy);
  return tau - (torqueAtTwistRate(l, phi) * l.outerRadius) / polar(l);
}

/**
 * Tangent rigidity dT/dφ at twist per length φ ≥ 0, N·m²: from T = 2π∫τ(rφ)r²dr, dT/dφ = 2π∫τ'r³dr
 * = G·J_core + H·J_rim, the polar moments of the still-elastic core and of the yielded rim (the
 * terms from the moving core radius cancel, τ being continuous there). Derived here from the same
 * section integral as `torqueAtTwistRate`.
 */
export function tangentRigidity(l: TorsionLaw, phi: number): number {
  const { outerRadius: c2, innerRadius: c1, shearModulus: g, hardeningModulus: h } = l;
  const rho = coreRadius(l, phi);
  if (rho >= c2) return g * polar(l);
  const a = Math.max(rho, c1);
  const a4 = fourth(a);
  return (Math.PI / 2) * ((rho > c1 ? g * (a4 - fourth(c1)) : 0) + h * (fourth(c2) - a4));
}
