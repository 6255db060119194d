import type { LineDevice, LineFitting } from '../../hydraulics/index';
import type { LineDesign } from '../validations/line-design';

/** A design edit that cannot be made, with words for the person making it. */
export class DesignEditError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'DesignEditError';
  }
}

const byChainage = <T extends { chainageM: number }>(items: readonly T[]) =>
  [...items].sort((a, b) => a.chainageM - b.chainageM);

/** Splits the stretch that contains `chainageM` in two; both halves keep its pipe. */
export function splitStretch(design: LineDesign, chainageM: number): LineDesign {
  const index = design.stretches.findIndex((s) => chainageM > s.fromM && chainageM < s.toM);
  if (index < 0) throw new DesignEditError(`No stretch runs through ${chainageM} m (or it is already a stretch end)`);
  const s = design.stretches[index];
  const stretches = [...design.stretches];
  stretches.splice(index, 1, { ...s, toM: chainageM }, { ...s, fromM: chainageM });
  return { ...design, stretches };
}

/** Joins stretch `index` with the next one; the joined stretch keeps the first one's pipe. */
export function mergeWithNext(design: LineDesign, index: number): LineDesign {
  if (index < 0 || index >= design.stretches.length - 1)
    throw new DesignEditError('Only a stretch with another after it can be joined to it');
  const stretches = [...design.stretches];
  stretches.splice(index, 2, { ...stretches[index], toM: stretches[index + 1].toM });
  return { ...design, stretches };
}

/** Moves the joint between stretch `index` and the next to `chainageM`. */
export function moveJoint(design: LineDesign, index: number, chainageM: number): LineDesign {
  const a = design.stretches[index];
  const b = design.stretches[index + 1];
  if (!a || !b) throw new DesignEditError('The last stretch ends where the line ends');
  if (!(chainageM > a.fromM && chainageM < b.toM))
    throw new DesignEditError(`The joint must lie between ${a.fromM} m and ${b.toM} m`);
  const stretches = [...design.stretches];
  stretches.splice(index, 2, { ...a, toM: chainageM }, { ...b, fromM: chainageM });
  return { ...design, stretches };
}

/** Gives stretch `index` a pipe (a catalogue or custom pipe id). */
export function setStretchPipe(design: LineDesign, index: number, pipeId: string): LineDesign {
  if (!design.stretches[index]) throw new DesignEditError(`No stretch ${index + 1}`);
  return { ...design, stretches: design.stretches.map((s, i) => (i === index ? { ...s, pipe: pipeId } : s)) };
}

/** Adds a device, keeping the list in chainage order. */
export function addDevice(design: LineDesign, device: LineDevice): LineDesign {
  return { ...design, devices: byChainage([...design.devices, device]) };
}

export function removeDevice(design: LineDesign, index: number): LineDesign {
  return { ...design, devices: design.devices.filter((_, i) => i !== index) };
}

export function addFitting(design: LineDesign, fitting: LineFitting): LineDesign {
  return { ...design, fittings: byChainage([...design.fittings, fitting]) };
}

export function removeFitting(design: LineDesign, index: number): LineDesign {
  return { ...design, fittings: design.fittings.filter((_, i) => i !== index) };
}
