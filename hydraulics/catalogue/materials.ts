import type { PipeMaterial } from './pipe-spec';

/** Friction and stiffness data for one pipe material grade, each value with its source. */
export interface MaterialProperties {
  material: PipeMaterial;
  /** Hazen-Williams C for new pipe in water service. */
  hazenWilliamsC: number;
  /** Absolute roughness for Darcy-Weisbach, m. */
  roughnessM: number;
  /** Short-term elastic modulus of the wall, Pa (sets the surge wave speed). */
  elasticModulusPa: number;
  sources: { hazenWilliamsC: string; roughnessM: string; elasticModulusPa: string };
}

const SMOOTH_PIPE_ROUGHNESS_SOURCE =
  'Hydraulic Institute, Engineering Data Book: smooth pipe ε ≤ 0.000005 ft (1.5 µm), as quoted in core.md §1.5 [R19]';

/** Material grades used by the catalogue series. */
export const MATERIAL_GRADES = {
  pvc: {
    material: 'pvc',
    hazenWilliamsC: 150,
    roughnessM: 1.5e-6,
    elasticModulusPa: 2.76e9,
    sources: {
      hazenWilliamsC: 'hydro-canada technical data: "C = 150 for PVC and CPVC" [R19]',
      roughnessM: SMOOTH_PIPE_ROUGHNESS_SOURCE,
      elasticModulusPa: '400,000 psi (2.76 GPa), from memory (core.md §5 [M])',
    },
  },
  'pe-astm': {
    material: 'pe',
    hazenWilliamsC: 150,
    roughnessM: 1.5e-6,
    elasticModulusPa: 0.9e9,
    sources: {
      hazenWilliamsC: 'design-coefficient table, plastic/PE typical design C = 150 (core.md §1.4 [R19])',
      roughnessM: SMOOTH_PIPE_ROUGHNESS_SOURCE,
      elasticModulusPa: '130,000 psi (≈0.9 GPa) for PE3408, from memory (core.md §5 [M])',
    },
  },
  pe100: {
    material: 'pe',
    hazenWilliamsC: 150,
    roughnessM: 1.5e-6,
    elasticModulusPa: 1.0e9,
    sources: {
      hazenWilliamsC: 'design-coefficient table, plastic/PE typical design C = 150 (core.md §1.4 [R19])',
      roughnessM: SMOOTH_PIPE_ROUGHNESS_SOURCE,
      elasticModulusPa: 'PE100 material data: short-term E 750-1250 MPa [R12]; midpoint 1.0 GPa taken',
    },
  },
  pe80: {
    material: 'pe',
    hazenWilliamsC: 150,
    roughnessM: 1.5e-6,
    elasticModulusPa: 0.8e9,
    sources: {
      hazenWilliamsC: 'design-coefficient table, plastic/PE typical design C = 150 (core.md §1.4 [R19])',
      roughnessM: SMOOTH_PIPE_ROUGHNESS_SOURCE,
      elasticModulusPa: '0.8 GPa, from memory (core.md §5 [M])',
    },
  },
  'steel-galvanized': {
    material: 'steel',
    hazenWilliamsC: 110,
    roughnessM: 0.15e-3,
    elasticModulusPa: 207e9,
    sources: {
      hazenWilliamsC:
        'Boesch Engineering C-factor table: galvanized iron 110 [R19] (120 is often quoted; the lower value is kept)',
      roughnessM:
        'Idelchik, Handbook of Hydraulic Resistance, 4th ed.: ordinary galvanization 0.10-0.15 mm (via fluids [R16]); upper value',
      elasticModulusPa: '207 GPa, from memory (core.md §5 [M])',
    },
  },
} as const satisfies Record<string, MaterialProperties>;

export type MaterialGrade = keyof typeof MATERIAL_GRADES;
