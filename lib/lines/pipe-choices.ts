import { findPipe, PIPE_SERIES, type PipeSpec } from '../../hydraulics/index';

/** One pressure class of a family: a catalogue series, its sizes smallest bore first. */
export interface PipeClassChoice {
  seriesId: string;
  label: string;
  pipes: { id: string; size: string }[];
}

/** Pipes of one material and standard, by class. */
export interface PipeFamily {
  id: string;
  label: string;
  classes: PipeClassChoice[];
}

const FAMILY_LABELS: Record<string, string> = {
  'pe100-iso4427': 'PE100 polyethylene (ISO 4427)',
  'pe80-iso4427': 'PE80 polyethylene (ISO 4427)',
  'pe-d2239': 'Polyethylene, controlled ID (ASTM D2239)',
  'pvc-d2241': 'PVC, SDR-rated (ASTM D2241)',
  'steel-sch40': 'Galvanized steel Schedule 40',
};

/** `pvc-d2241-sdr21` -> `pvc-d2241`; `steel-sch40` stays. */
export function familyIdOf(seriesId: string): string {
  return seriesId.replace(/-s?i?dr[\d.]+$/, '');
}

/** The class part of a series label: `PE100 SDR 11 (ISO 4427, PN 16)` -> `SDR 11, PN 16`. */
function classLabel(seriesLabel: string): string {
  const ratio = /S?I?DR [\d.]+/.exec(seriesLabel)?.[0];
  const rating = /(PN [\d.]+|\d+ psi)/.exec(seriesLabel)?.[0];
  return [ratio, rating].filter(Boolean).join(', ') || seriesLabel;
}

/** The catalogue grouped for pickers: family (material and standard) -> class -> size. */
export const PIPE_FAMILIES: readonly PipeFamily[] = (() => {
  const families = new Map<string, PipeFamily>();
  for (const series of PIPE_SERIES) {
    const id = familyIdOf(series.id);
    const family = families.get(id) ?? { id, label: FAMILY_LABELS[id] ?? id, classes: [] };
    family.classes.push({
      seriesId: series.id,
      label: classLabel(series.label),
      pipes: [...series.pipes]
        .sort((a, b) => a.insideDiameterM - b.insideDiameterM)
        .map((p) => ({ id: p.id, size: p.nominalSize })),
    });
    families.set(id, family);
  }
  return [...families.values()];
})();

/** Where a catalogue pipe sits in the pickers, or null for a custom pipe. */
export function pipeChoiceOf(pipeId: string): { familyId: string; seriesId: string } | null {
  for (const family of PIPE_FAMILIES) {
    for (const c of family.classes)
      if (c.pipes.some((p) => p.id === pipeId)) return { familyId: family.id, seriesId: c.seriesId };
  }
  return null;
}

/** The pipe of `seriesId` whose bore is closest to `current`'s: changing class keeps the size. */
export function closestInSeries(seriesId: string, current: PipeSpec | undefined): string {
  const series = PIPE_SERIES.find((s) => s.id === seriesId);
  if (!series || series.pipes.length === 0) throw new Error(`unknown pipe series ${seriesId}`);
  const bore = current?.insideDiameterM ?? 0.05;
  return [...series.pipes].sort((a, b) => Math.abs(a.insideDiameterM - bore) - Math.abs(b.insideDiameterM - bore))[0]
    .id;
}

/**
 * The pipe to take when the material (family) changes: the size whose bore is nearest the current
 * pipe's, in the class rated nearest the current pipe's rating and not below it where the family has
 * one (else the highest rated). Classes of a family do not all carry every size (PVC SDR 13.5 is
 * made in 1/2 in only), so taking the family's first class would shrink the pipe.
 */
export function pipeForFamily(familyId: string, current: PipeSpec | undefined): string {
  const family = PIPE_FAMILIES.find((f) => f.id === familyId);
  if (!family) throw new Error(`unknown pipe family ${familyId}`);
  const bore = current?.insideDiameterM ?? 0.05;
  const nearest = family.classes.map((c) => findPipe(closestInSeries(c.seriesId, current))!);
  const best = Math.min(...nearest.map((p) => Math.abs(p.insideDiameterM - bore)));
  // Classes that offer (about) that size: bores of one nominal size differ by wall thickness only.
  const offering = nearest.filter((p) => Math.abs(p.insideDiameterM - bore) <= best + 0.1 * bore);
  const rating = current?.pressureRatingPa ?? 0;
  const atOrAbove = offering
    .filter((p) => p.pressureRatingPa >= rating)
    .sort((a, b) => a.pressureRatingPa - b.pressureRatingPa);
  const pick = atOrAbove[0] ?? [...offering].sort((a, b) => b.pressureRatingPa - a.pressureRatingPa)[0];
  return pick.id;
}

/** A stretch's pipe as a spec: inline, custom by id, or from the catalogue. */
export function resolvePipe(pipe: string | PipeSpec, custom: readonly PipeSpec[]): PipeSpec | undefined {
  if (typeof pipe !== 'string') return pipe;
  return custom.find((p) => p.id === pipe) ?? findPipe(pipe);
}
