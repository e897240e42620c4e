/** A formula the engine uses and where it comes from, for the report's list of sources. */
export interface FormulaSource {
  /** What the formula gives, in the trade's words. */
  what: string;
  formula: string;
  /** Book, edition, section or equation; "from memory" where recalled rather than read. */
  source: string;
  /** Listed only where the case has this element (a fit, a gearbox, a gearbox whose teeth are checked); otherwise always. */
  only?: 'fit' | 'gearbox' | 'gear teeth';
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
    what: 'Elastic–plastic torsion of a round section past yield (yield and fully plastic torque, torque–twist law, elastic unloading to the permanent twist)',
    formula: 'T_Y = τ_Y·J_p/c, T_P = (2π/3)·τ_Y·(c₂³ − c₁³), T = (4/3)·T_Y·[1 − ¼(φ_Y/φ)³] (solid), φ_p = φ − T/(G·J_p)',
    source:
      'Beer & Johnston, Mechanics of Materials, Sec. 3.9–3.11 (elastoplastic shafts, residual stresses); Hibbeler, Mechanics of Materials, Sec. 5.9–5.10 (from memory, confident); the hollow and hardening forms derived by integrating τ·r over the section',
  },
  {
    what: 'Linear strain-hardening slope in shear from tensile data (where the case asks for hardening)',
    formula: 'H_p = k²·(S_ut − S_y)/elongation, H = G·H_p/(G + H_p)',
    source: 'Dieter, Mechanical Metallurgy, 3rd ed., Sec. 3-9, effective stress and strain (from memory, verify the section)',
  },
  {
    what: 'Fracture shear strain of a ductile shaft from the reduction of area',
    formula: 'γ_f = √3·ln(1/(1 − RA)) (von Mises equivalence γ = √3·ε)',
    source: 'Dieter, Mechanical Metallurgy, 3rd ed., Sec. 8-3 (true fracture strain) and Sec. 3-9 (effective strain) (from memory, verify the sections)',
  },
  {
    what: 'Brittle material (elongation below 5 %) breaks at its tensile strength, with kt',
    formula: 'kt·τ = S_ut',
    source: 'Shigley 9th ed., Sec. 5-1 (brittle and ductile), Sec. 5-8 and 5-9 (brittle materials), Sec. 3-13 (kt under static load) (from memory, confident)',
  },
  {
    what: 'Reading a fracture surface (transverse flat face: ductile shear overload; 45° helix: brittle; beach marks: fatigue)',
    formula: 'the usual meanings of the surface, not a diagnosis',
    source:
      'ASM Handbook Vol. 11, Failure Analysis and Prevention (ASM International, 2002), "Failures of Shafts"; Beer & Johnston, Mechanics of Materials, Ch. 3, ductile and brittle specimens in torsion (from memory, verify the sections)',
  },
  {
    what: 'Stresses in a parallel key driving a hub (the key as fuse)',
    formula: 'F = 2T/d, τ = 2T/(d·w·l), σ = 4T/(d·h·l) (half the height bearing)',
    source: 'Shigley 9th ed., Sec. 7-7 (from memory, confident)',
  },
  {
    what: "Running torque from the drive's power",
    formula: 'T = P/ω',
    source: 'Shigley 9th ed., Sec. 3-12, Eqs. 3-40 to 3-44 (equation numbers from memory, verify)',
  },
  {
    what: 'Natural-frequency change of a replacement (single-mass estimate)',
    formula: 'ω_n = √(k/J), so ω_new/ω_old = √(k_new/k_old)',
    source: 'Den Hartog, Mechanical Vibrations (from memory, confident)',
  },
  {
    what: 'Monte Carlo over the tolerances: seeded uniform generator, normal draws, percentiles',
    formula: 'mulberry32 (32-bit state); Box–Muller z = √(−2 ln u₁)·cos(2π u₂); percentiles by linear interpolation between closest ranks',
    source:
      'mulberry32, T. Ettinger (public domain); Box & Muller, Ann. Math. Statist. 29 (1958) 610–611; Hyndman & Fan, The American Statistician 50 (1996) 361–365, definition 7 (from memory, confident)',
  },
  {
    what: 'Unit conversion factors',
    formula: 'inch = 0.0254 m, pound = 0.45359237 kg, g = 9.80665 m/s²',
    source: 'NIST Special Publication 811 (2008), Appendix B.8',
  },
  {
    what: 'Contact pressure of a shrink or press fit (thick-walled cylinders)',
    formula: 'p = (δ_d/2) / [ (R/E_o)·((r_o² + R²)/(r_o² − R²) + ν_o) + (R/E_i)·((R² + r_i²)/(R² − r_i²) − ν_i) ]',
    source: "Shigley's Mechanical Engineering Design, 9th ed., Sec. 3-16, Eq. (3-56) (from memory; equation number: verify)",
    only: 'fit',
  },
  {
    what: 'Torque a shrink or press fit holds before it slips',
    formula: 'T = π·μ·p·d²·L/2',
    source: 'Shigley 9th ed., Sec. 7-8 (from memory, confident; section number: verify)',
    only: 'fit',
  },
  {
    what: 'Local stress and strain range at a notch (fatigue of a jam)',
    formula: 'Δσ·Δε = (kt·ΔS)²/E on the Masing branch Δε = Δσ/E + 2(Δσ/2K′)^(1/n′); torsion as the von Mises equivalent √3·τ',
    source: 'Neuber, J. Appl. Mech. 28, 1961; Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 12 and 14; Socie & Marquis, Multiaxial Fatigue, 2000 (from memory)',
  },
  {
    what: 'Life to crack initiation at a strain amplitude',
    formula:
      'ε_a = (σ′_f/E)(2N)^b + ε′_f(2N)^c; constants where the case gives none by the uniform material law (steel: σ′_f = 1.5 S_u, b = −0.087, ε′_f = 0.59ψ, c = −0.58, K′ = 1.65 S_u, n′ = 0.15)',
    source: 'Coffin–Manson–Basquin as in Dowling 4th ed., Ch. 14; Bäumel & Seeger, Materials Data for Cyclic Loading, Suppl. 1, 1990 (from memory)',
  },
  {
    what: 'Cycles of the ring-down and the damage they add',
    formula: 'rainflow counting; D = Σ nᵢ/Nᵢ',
    source: 'ASTM E1049-85 (2017), Sec. 5.4.4; Palmgren 1924, Miner 1945 (from memory)',
  },
  {
    what: "A gear stage's input torque at the incident peak, and the motor's torque passed through it",
    formula: 'T_in = T_out/(η·i) driven forward, T_shaft = η·i·T_motor; η = P_out/P_in',
    source: "The definition of a gear unit's efficiency as output over input power (common practice; Shigley's Mechanical Engineering Design, 9th ed., Ch. 13, worm gearing; from memory)",
    only: 'gearbox',
  },
  {
    what: "A gear tooth's bending stress (a first estimate)",
    formula: 'σ = W_t/(F·m·Y), W_t = 2T/(m·z); Y for 20° full-depth teeth by tooth count',
    source: "Lewis equation: Shigley's Mechanical Engineering Design, 9th ed., Sec. 14-1, Eq. (14-3) and Table 14-2 (from memory; equation numbers: verify)",
    only: 'gear teeth',
  },
  {
    what: 'Fully plastic torque of a keyed seat (net section, sand heap)',
    formula: 'T_P = 2τ_Y·∫φ dA',
    source: 'Nadai, Theory of Flow and Fracture of Solids, vol. 1, 1950 (from memory, confident)',
  },
  {
    what: 'Damping per element of the dynamic model',
    formula: 'c_i = (2ζ_i/ω₁)·k_i; ζ = ψ/(4π)',
    source: 'Clough & Penzien, Dynamics of Structures, Sec. 12-4; DIN 740-2 (from memory)',
  },
];
