import { BAR_PA, INCH_M, PSI_PA } from '../constants';
import { PE_D2239_HDS_PSI, PE_D2239_ROWS, PE_D2239_SIDRS, PE_D2239_SOURCE } from './data/pe-d2239';
import {
  PE_ISO4427_DESIGN_STRESS_MPA,
  PE_ISO4427_ROWS,
  PE_ISO4427_SDRS,
  PE_ISO4427_SOURCE,
  isoMeanBoreMm,
  isoWallToleranceMm,
} from './data/pe-iso4427';
import {
  PVC_D2241_HDS_PSI,
  PVC_D2241_MINIMUM_WALL_ONLY,
  PVC_D2241_ROWS,
  PVC_D2241_SOURCE,
  type PvcSdr,
} from './data/pvc-d2241';
import { STEEL_ALLOWABLE_STRESS_PSI, STEEL_SCH40_ROWS, STEEL_SCH40_SOURCE } from './data/steel-sch40';
import { MATERIAL_GRADES, type MaterialGrade } from './materials';
import { astmMinimumWallIn, inchSizeSlug, type PipeSeries } from './pipe-series';
import type { PipeSpec } from './pipe-spec';
import {
  ASTM_PRESSURE_CLASSES_PSI,
  ISO_PRESSURE_CLASSES_BAR,
  nominalPressureClass,
  pressureRatingFromSdr,
  pressureRatingFromSidr,
} from './pressure-rating';
import { kortewegWaveSpeedMs } from './wave-speed';

/** Material-dependent fields of a spec, wave speed from the Korteweg formula. */
function materialFields(grade: MaterialGrade, insideDiameterM: number, wallM: number) {
  const properties = MATERIAL_GRADES[grade];
  return {
    material: properties.material,
    hazenWilliamsC: properties.hazenWilliamsC,
    roughnessM: properties.roughnessM,
    waveSpeedMs: kortewegWaveSpeedMs({ insideDiameterM, wallM, elasticModulusPa: properties.elasticModulusPa }),
  };
}

/** ASTM D2241 PVC series for one SDR: every size the data lists for it. */
export function buildPvcD2241Series(sdr: PvcSdr): PipeSeries {
  const id = `pvc-d2241-sdr${sdr}`;
  const ratingPsi = nominalPressureClass({
    computed: pressureRatingFromSdr({ sdr, designStressPa: PVC_D2241_HDS_PSI }),
    classes: ASTM_PRESSURE_CLASSES_PSI,
  });
  const pipes: PipeSpec[] = [];
  for (const row of PVC_D2241_ROWS) {
    const averageWallIn = row.averageWallIn[sdr];
    const minimumWallOnly = PVC_D2241_MINIMUM_WALL_ONLY[row.size]?.includes(sdr) ?? false;
    if (averageWallIn === undefined && !minimumWallOnly) continue;
    const wallIn = astmMinimumWallIn(row.outsideDiameterIn, sdr);
    const insideDiameterM = (row.outsideDiameterIn - 2 * (averageWallIn ?? wallIn)) * INCH_M;
    const wallM = wallIn * INCH_M;
    pipes.push({
      id: `${id}-${inchSizeSlug(row.size)}`,
      label: `${row.size} in PVC SDR ${sdr} (${ratingPsi} psi)`,
      nominalSize: `${row.size} in`,
      outsideDiameterM: row.outsideDiameterIn * INCH_M,
      insideDiameterM,
      wallM,
      pressureRatingPa: ratingPsi * PSI_PA,
      ...materialFields('pvc', insideDiameterM, wallM),
      source: averageWallIn === undefined ? `${PVC_D2241_SOURCE} (flow diameter from minimum wall)` : PVC_D2241_SOURCE,
      sdr,
    });
  }
  return { id, label: `PVC SDR ${sdr} (ASTM D2241, ${ratingPsi} psi)`, pipes };
}

/** ASTM D2239 PE series for one SIDR. */
export function buildPeD2239Series(sidr: (typeof PE_D2239_SIDRS)[number]): PipeSeries {
  const id = `pe-d2239-sidr${sidr}`;
  const ratingPsi = nominalPressureClass({
    computed: pressureRatingFromSidr({ sidr, designStressPa: PE_D2239_HDS_PSI }),
    classes: ASTM_PRESSURE_CLASSES_PSI,
  });
  const pipes = PE_D2239_ROWS.map((row): PipeSpec => {
    const wallIn = astmMinimumWallIn(row.insideDiameterIn, sidr);
    const insideDiameterM = row.insideDiameterIn * INCH_M;
    const wallM = wallIn * INCH_M;
    return {
      id: `${id}-${inchSizeSlug(row.size)}`,
      label: `${row.size} in PE SIDR ${sidr} (${ratingPsi} psi)`,
      nominalSize: `${row.size} in`,
      outsideDiameterM: (row.insideDiameterIn + 2 * wallIn) * INCH_M,
      insideDiameterM,
      wallM,
      pressureRatingPa: ratingPsi * PSI_PA,
      ...materialFields('pe-astm', insideDiameterM, wallM),
      source: PE_D2239_SOURCE,
      sidr,
    };
  });
  return { id, label: `PE SIDR ${sidr} (ASTM D2239, ${ratingPsi} psi)`, pipes };
}

/** ISO 4427 / EN 12201 PE100 or PE80 series for one SDR, walls from the stored table. */
export function buildPeIso4427Series(grade: 'pe100' | 'pe80', sdr: (typeof PE_ISO4427_SDRS)[number]): PipeSeries {
  const id = `${grade}-iso4427-sdr${sdr}`;
  const column = PE_ISO4427_SDRS.indexOf(sdr);
  const designStressBar = PE_ISO4427_DESIGN_STRESS_MPA[grade] * 10;
  const pn = nominalPressureClass({
    computed: pressureRatingFromSdr({ sdr, designStressPa: designStressBar }),
    classes: ISO_PRESSURE_CLASSES_BAR,
    maxRoundUp: 0.02,
  });
  const gradeLabel = grade.toUpperCase();
  const pipes: PipeSpec[] = [];
  for (const row of PE_ISO4427_ROWS) {
    const wallMm = row.wallMm[column];
    if (wallMm === null) continue;
    // Flow bore from the mean diameter and mean wall; the printed minimum wall stays the pipe's wall.
    const insideDiameterM = isoMeanBoreMm(row.outsideDiameterMm, row.outsideToleranceMm, wallMm) / 1000;
    const meanWallM = (wallMm + isoWallToleranceMm(wallMm) / 2) / 1000;
    const wallM = wallMm / 1000;
    pipes.push({
      id: `${id}-${row.outsideDiameterMm}mm`,
      label: `${row.outsideDiameterMm} mm ${gradeLabel} SDR ${sdr} (PN ${pn})`,
      nominalSize: `${row.outsideDiameterMm} mm`,
      outsideDiameterM: row.outsideDiameterMm / 1000,
      insideDiameterM,
      wallM,
      pressureRatingPa: pn * BAR_PA,
      ...materialFields(grade, insideDiameterM, meanWallM),
      source: `${PE_ISO4427_SOURCE}; ${gradeLabel} σ = ${PE_ISO4427_DESIGN_STRESS_MPA[grade]} MPa`,
      sdr,
    });
  }
  return { id, label: `${gradeLabel} SDR ${sdr} (ISO 4427, PN ${pn})`, pipes };
}

/**
 * Galvanized steel Schedule 40 series. Rating by Barlow on the wall left after a 12.5 % mill
 * tolerance and the thread depth (threaded joints are the norm in small water lines):
 * P = 2 S (0.875 t − c) / D (ASME B31.3-style allowances, from memory). Fittings and joints often
 * rate lower than the pipe; defer to the fitting maker and local codes.
 */
export function buildSteelSch40Series(): PipeSeries {
  const id = 'steel-sch40';
  const pipes = STEEL_SCH40_ROWS.map((row): PipeSpec => {
    const insideDiameterM = row.insideDiameterIn * INCH_M;
    const wallM = row.wallIn * INCH_M;
    const remainingWallIn = 0.875 * row.wallIn - row.threadDepthIn;
    const ratingPsi = (2 * STEEL_ALLOWABLE_STRESS_PSI * remainingWallIn) / row.outsideDiameterIn;
    return {
      id: `${id}-${inchSizeSlug(row.size)}`,
      label: `${row.size} in galvanized steel Sch 40`,
      nominalSize: `${row.size} in`,
      outsideDiameterM: row.outsideDiameterIn * INCH_M,
      insideDiameterM,
      wallM,
      pressureRatingPa: ratingPsi * PSI_PA,
      ...materialFields('steel-galvanized', insideDiameterM, wallM),
      source: STEEL_SCH40_SOURCE,
    };
  });
  return { id, label: 'Galvanized steel Schedule 40 (ASME B36.10M, threaded)', pipes };
}
