/** A formula the engine uses and where it comes from, for the report's list of sources. */
export interface FormulaSource {
  /** What the formula gives, in the trade's words. */
  what: string;
  formula: string;
  /** Book, edition, section or equation; "from memory" where recalled rather than read. */
  source: string;
}

/**
 * The sources of the engine's formulas, as cited beside each formula in src/physics/. A new formula
 * adds its entry here so the report lists it.
 */
export const FORMULA_SOURCES: readonly FormulaSource[] = [
  {
    what: 'Peak torque of a sudden stop (elastic energy method)',
    formula: 'T = √(2E/C), E = Σ ½·J·ω², C = Σ L/(G·J_p)',
    source: 'Gere & Goodno, Mechanics of Materials, 7th ed., Sec. 3.9 and Problem 3.9-11 (from memory, confident)',
  },
  {
    what: 'Polar second moment of area of a solid or bored round shaft',
    formula: 'J_p = π(d⁴ − d_i⁴)/32',
    source: "Shigley's Mechanical Engineering Design, 9th ed., Sec. 3-12; Gere & Goodno 7th ed., Ch. 3 (from memory, confident)",
  },
  {
    what: 'Outer-fibre shear stress in torsion, with the stress-concentration factor',
    formula: 'τ = kt·T·(d/2)/J_p',
    source: 'Shigley 9th ed., Sec. 3-12 (torsion) and Sec. 3-13 (stress concentration) (from memory; section numbers: verify)',
  },
  {
    what: 'Angle of twist and strain energy of a shaft in torsion',
    formula: 'θ = T·L/(G·J_p), U = T²·C/2',
    source: 'Shigley 9th ed., Sec. 4-7; Gere & Goodno 7th ed., Sec. 3.9 (from memory, confident)',
  },
  {
    what: 'Mass moment of inertia of a disc, and of a mass with its radius of gyration',
    formula: 'J = (π/32)·ρ·t·(D⁴ − d⁴), J = m·k²',
    source: 'Beer & Johnston, Vector Mechanics for Engineers: Dynamics, table of mass moments of inertia (from memory, confident)',
  },
  {
    what: 'Inertia of a part turning through a belt or gear ratio, felt at shaft speed',
    formula: 'J_shaft = J·r²',
    source: 'Den Hartog, Mechanical Vibrations, geared systems (from memory, confident)',
  },
  {
    what: 'Shear yield strength from the tensile yield strength',
    formula: 'S_sy = S_y/√3 (distortion energy) or 0.5·S_y (maximum shear)',
    source: 'Shigley 9th ed., Sec. 5-4 and 5-5 (from memory, confident)',
  },
  {
    what: 'Ultimate shear strength estimate of steels (comparison table only)',
    formula: 'S_su ≈ 0.67·S_ut',
    source: 'Shigley 9th ed., Sec. 6-15 (from memory, confident)',
  },
  {
    what: 'Unit conversion factors',
    formula: 'inch = 0.0254 m, pound = 0.45359237 kg, g = 9.80665 m/s²',
    source: 'NIST Special Publication 811 (2008), Appendix B.8',
  },
];
