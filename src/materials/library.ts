import type { Material } from './material.ts';

const MPa = 1e6;
const GPa = 1e9;
/** 1 lb/in³ in kg/m³ (derived from the exact inch and pound). */
const LB_PER_IN3 = 0.45359237 / 0.0254 ** 3;

// Elastic constants of the steel, stainless, aluminium and gray-iron classes: Shigley's Mechanical
// Engineering Design, 9th ed. (Budynas & Nisbett, 2011), Table A-5 (from memory, confident).
// A-5's G is listed, not computed from E and ν; we keep the listed value.
const CARBON_STEEL = { elasticModulus: 207 * GPa, shearModulus: 79.3 * GPa, poissonRatio: 0.292, density: 0.282 * LB_PER_IN3 };
const A5 = "elastic constants (E, G, Poisson's ratio) and density: Shigley 9th ed. Table A-5 (from memory, confident)";
const A20 = 'strengths: Shigley 9th ed. Table A-20, estimated ASTM minimum (from memory, confident; reduction of area from memory, verify)';

/**
 * The built-in materials. Strengths are published minima unless `strengthBasis` says typical: a
 * real bar is usually stronger than its minimum, which matters when reading damage back.
 */
export const MATERIAL_LIBRARY: readonly Material[] = [
  {
    key: 'aisi-1018-cd',
    name: 'AISI 1018 steel, cold drawn',
    ...CARBON_STEEL,
    yieldStrength: 370 * MPa,
    tensileStrength: 440 * MPa,
    elongation: 0.15,
    reductionOfArea: 0.4,
    strengthBasis: 'minimum',
    source: `${A20}; ${A5}`,
  },
  {
    key: 'aisi-1020-hr',
    name: 'AISI 1020 steel, hot rolled',
    ...CARBON_STEEL,
    yieldStrength: 210 * MPa,
    tensileStrength: 380 * MPa,
    elongation: 0.25,
    reductionOfArea: 0.5,
    strengthBasis: 'minimum',
    source: `${A20}; ${A5}`,
  },
  {
    key: 'aisi-1020-cd',
    name: 'AISI 1020 steel, cold drawn',
    ...CARBON_STEEL,
    yieldStrength: 390 * MPa,
    tensileStrength: 470 * MPa,
    elongation: 0.15,
    reductionOfArea: 0.4,
    strengthBasis: 'minimum',
    source: `${A20}; ${A5}`,
  },
  {
    key: 'aisi-1045-hr',
    name: 'AISI 1045 steel, hot rolled',
    ...CARBON_STEEL,
    yieldStrength: 310 * MPa,
    tensileStrength: 570 * MPa,
    elongation: 0.16,
    reductionOfArea: 0.4,
    strengthBasis: 'minimum',
    source: `${A20}; ${A5}`,
  },
  {
    key: 'aisi-1045-cd',
    name: 'AISI 1045 steel, cold drawn',
    ...CARBON_STEEL,
    yieldStrength: 530 * MPa,
    tensileStrength: 630 * MPa,
    elongation: 0.12,
    reductionOfArea: 0.35,
    strengthBasis: 'minimum',
    source: `${A20}; ${A5}`,
  },
  {
    key: 'aisi-4140-annealed',
    name: 'AISI 4140 steel, annealed at 815 °C',
    ...CARBON_STEEL,
    yieldStrength: 417 * MPa,
    tensileStrength: 655 * MPa,
    elongation: 0.257,
    reductionOfArea: 0.569,
    strengthBasis: 'typical',
    source: `strengths: ASM data as in Shigley 9th ed. Table A-21, mean values (from memory, confident); ${A5}`,
  },
  {
    key: 'aisi-4140-normalized',
    name: 'AISI 4140 steel, normalised at 870 °C',
    ...CARBON_STEEL,
    yieldStrength: 655 * MPa,
    tensileStrength: 1020 * MPa,
    elongation: 0.177,
    reductionOfArea: 0.47,
    strengthBasis: 'typical',
    source: `strengths: ASM data as in Shigley 9th ed. Table A-21, mean values (from memory, confident; reduction of area from memory, verify); ${A5}`,
  },
  {
    key: 'aisi-4140-qt540',
    name: 'AISI 4140 steel, quenched and tempered at 540 °C',
    ...CARBON_STEEL,
    yieldStrength: 834 * MPa,
    tensileStrength: 951 * MPa,
    elongation: 0.18,
    reductionOfArea: 0.55,
    strengthBasis: 'typical',
    source: `strengths: ASM data as in Shigley 9th ed. Table A-21, mean values (from memory, confident; reduction of area from memory, verify); ${A5}`,
  },
  {
    key: 'aisi-4340-qt540',
    name: 'AISI 4340 steel, quenched and tempered at 540 °C',
    ...CARBON_STEEL,
    density: 7850,
    yieldStrength: 1080 * MPa,
    tensileStrength: 1170 * MPa,
    elongation: 0.13,
    reductionOfArea: 0.5,
    strengthBasis: 'typical',
    source: 'strengths: Shigley 9th ed. Table A-21, ASM mean values (from memory, verify); elastic constants Table A-5 (from memory, confident)',
  },
  {
    key: 'ss-304-annealed',
    name: 'Type 304 stainless steel, annealed bar',
    elasticModulus: 193 * GPa,
    shearModulus: 77 * GPa,
    poissonRatio: 0.29,
    density: 8000,
    yieldStrength: 205 * MPa,
    tensileStrength: 515 * MPa,
    elongation: 0.4,
    reductionOfArea: 0.5,
    strengthBasis: 'minimum',
    source:
      "strengths: ASTM A276 minima (from memory, confident); E, G, Poisson's ratio 0.29, density: typical producer data for 304 (from memory, verify; Shigley 9th ed. Table A-5 gives 0.305 for the stainless class)",
  },
  {
    key: 'ss-316-annealed',
    name: 'Type 316 stainless steel, annealed bar',
    elasticModulus: 193 * GPa,
    shearModulus: 77 * GPa,
    poissonRatio: 0.29,
    density: 8000,
    yieldStrength: 205 * MPa,
    tensileStrength: 515 * MPa,
    elongation: 0.4,
    reductionOfArea: 0.5,
    strengthBasis: 'minimum',
    source:
      "strengths: ASTM A276 minima (from memory, confident); E, G, Poisson's ratio 0.29, density: typical producer data (from memory, verify; Shigley 9th ed. Table A-5 gives 0.305 for the stainless class)",
  },
  {
    key: 'ss-17-4ph-h1150',
    name: '17-4PH stainless steel (UNS S17400), condition H1150',
    elasticModulus: 197 * GPa,
    shearModulus: 77 * GPa,
    poissonRatio: 0.27,
    density: 7810,
    yieldStrength: 725 * MPa,
    tensileStrength: 930 * MPa,
    elongation: 0.16,
    reductionOfArea: 0.5,
    strengthBasis: 'minimum',
    source: "ASTM A564 minima and producer data bulletin, Poisson's ratio 0.27 from the same bulletin (from memory, verify)",
  },
  {
    key: 'al-6061-t6',
    name: 'Aluminium alloy 6061-T6',
    elasticModulus: 68.9 * GPa,
    shearModulus: 26.0 * GPa,
    poissonRatio: 0.33,
    density: 2700,
    yieldStrength: 276 * MPa,
    tensileStrength: 310 * MPa,
    elongation: 0.17,
    strengthBasis: 'typical',
    source: "Aluminum Association typical values, Poisson's ratio 0.33 (from memory, confident)",
  },
  {
    key: 'al-7075-t6',
    name: 'Aluminium alloy 7075-T6',
    elasticModulus: 71.7 * GPa,
    shearModulus: 26.9 * GPa,
    poissonRatio: 0.33,
    density: 2810,
    yieldStrength: 503 * MPa,
    tensileStrength: 572 * MPa,
    elongation: 0.11,
    strengthBasis: 'typical',
    source: "Aluminum Association typical values, Poisson's ratio 0.33 (from memory, confident)",
  },
  {
    key: 'gray-iron-30',
    name: 'Gray cast iron, ASTM A48 class 30',
    elasticModulus: 100 * GPa,
    shearModulus: 41.4 * GPa,
    poissonRatio: 0.211,
    density: 0.26 * LB_PER_IN3,
    // Gray iron has no yield point; its tensile strength stands in so a shaft check still has a
    // limit, and the plastic analysis treats it as brittle (elongation below 5 %).
    yieldStrength: 207 * MPa,
    tensileStrength: 207 * MPa,
    elongation: 0.005,
    strengthBasis: 'minimum',
    source:
      "tensile strength: ASTM A48 class 30 minimum (from memory, confident); elastic constants and Poisson's ratio Shigley 9th ed. Table A-5 (from memory, confident); no yield point, tensile strength used as the limit",
  },
  {
    key: 'ductile-iron-65-45-12',
    name: 'Ductile iron, ASTM A536 grade 65-45-12',
    elasticModulus: 169 * GPa,
    shearModulus: 64 * GPa,
    poissonRatio: 0.275,
    density: 7100,
    yieldStrength: 310 * MPa,
    tensileStrength: 448 * MPa,
    elongation: 0.12,
    strengthBasis: 'minimum',
    source:
      "strengths: ASTM A536 (the grade names the minimum tensile, yield and elongation; from memory, confident); E, G, Poisson's ratio 0.275, density: typical producer data (from memory, verify)",
  },
];

export function findMaterial(key: string): Material | undefined {
  return MATERIAL_LIBRARY.find((m) => m.key === key);
}
