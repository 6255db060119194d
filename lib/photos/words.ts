import { formatQuantity, type UnitSystem } from '../units/index';
import type { PhotoPlacement } from '../../models/site-photo';

/** When a photo was taken, as its camera's clock wrote it (minutes; the file gives no time zone). */
export const takenWords = (takenAt: string | Date | null): string => {
  if (!takenAt) return 'time not recorded';
  const iso = typeof takenAt === 'string' ? takenAt : takenAt.toISOString();
  return iso.slice(0, 16).replace('T', ' ');
};

/** How far from the line the photo was taken, or how it got its place when it has no position. */
export function offLineWords(photo: { offsetM: number | null; placement: PhotoPlacement }, units: UnitSystem): string {
  if (photo.offsetM !== null) return `${formatQuantity('length', photo.offsetM, units)} off the line`;
  return photo.placement === 'picked' ? 'no position in the file: chainage picked by hand' : 'not placed on the route';
}
