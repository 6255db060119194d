import { HydraulicsInputError } from '../../errors';
import {
  assertArray,
  assertFinite,
  assertNonNegative,
  assertOneOf,
  assertOptionalNonNegative,
  assertRecord,
} from './numbers';

const DEVICE_KINDS = ['break-pressure-tank', 'air-release-valve', 'washout', 'isolation-valve'] as const;

function assertOnLine(chainageM: number, firstM: number, lastM: number, field: string, index: number): void {
  if (chainageM < firstM || chainageM > lastM) {
    throw new HydraulicsInputError(field, `${chainageM} m lies outside the line (${firstM} m to ${lastM} m)`, index, {
      chainageM,
      fromM: firstM,
      toM: lastM,
    });
  }
}

/** Fittings: chainage on the line, K finite and not negative. */
export function assertFittings(fittings: unknown, firstM: number, lastM: number): void {
  if (fittings === undefined) return;
  assertArray(fittings, 'fittings');
  fittings.forEach((fitting: unknown, i) => {
    assertRecord(fitting, 'fittings', i);
    assertFinite(fitting.chainageM, 'fittings.chainageM', i);
    assertOnLine(fitting.chainageM, firstM, lastM, 'fittings.chainageM', i);
    assertNonNegative(fitting.k, 'fittings.k', i);
  });
}

/** Devices: a known kind, chainage on the line, a finite tank level when given. */
export function assertDevices(devices: unknown, firstM: number, lastM: number): void {
  if (devices === undefined) return;
  assertArray(devices, 'devices');
  devices.forEach((device: unknown, i) => {
    assertRecord(device, 'devices', i);
    assertOneOf(device.kind, DEVICE_KINDS, 'devices.kind', i);
    assertFinite(device.chainageM, 'devices.chainageM', i);
    assertOnLine(device.chainageM, firstM, lastM, 'devices.chainageM', i);
    if (device.waterLevelM !== undefined) assertFinite(device.waterLevelM, 'devices.waterLevelM', i);
  });
}

/** Start: a water level, or a pump's outlet (and optional shut-off) head. */
export function assertStart(start: unknown): void {
  assertRecord(start, 'start');
  assertOneOf(start.kind, ['water-level', 'pump'] as const, 'start.kind');
  if (start.kind === 'water-level') {
    assertFinite(start.levelM, 'start.levelM');
  } else {
    assertFinite(start.outletHeadM, 'start.outletHeadM');
    if (start.shutoffHeadM !== undefined) {
      assertFinite(start.shutoffHeadM, 'start.shutoffHeadM');
      if (start.shutoffHeadM < start.outletHeadM) {
        throw new HydraulicsInputError(
          'start.shutoffHeadM',
          `the grade with the line shut (${start.shutoffHeadM} m) is below the grade while pumping (${start.outletHeadM} m): a pump builds more head against a shut line, not less`,
        );
      }
    }
  }
}

/** End: an outlet or tank inlet with an elevation, or free discharge. */
export function assertEnd(end: unknown): void {
  assertRecord(end, 'end');
  assertOneOf(end.kind, ['outlet', 'tank-inlet', 'free-discharge'] as const, 'end.kind');
  if (end.kind !== 'free-discharge') assertFinite(end.elevationM, 'end.elevationM');
  if (end.kind === 'outlet') assertOptionalNonNegative(end.residualHeadM, 'end.residualHeadM');
}

/** Flow: a design flow >= 0, "find", or a schedule of flows >= 0 by increasing chainage. */
export function assertFlow(flow: unknown): void {
  assertRecord(flow, 'flow');
  assertOneOf(flow.kind, ['design', 'find', 'schedule'] as const, 'flow.kind');
  if (flow.kind === 'design') assertNonNegative(flow.flowM3s, 'flow.flowM3s');
  if (flow.kind === 'schedule') {
    const pieces = flow.pieces;
    if (!Array.isArray(pieces) || pieces.length === 0)
      throw new HydraulicsInputError('flow.pieces', 'needs at least one piece');
    pieces.forEach((piece: unknown, index: number) => {
      assertRecord(piece, 'flow.pieces');
      assertFinite(piece.fromM, 'flow.pieces.fromM', index);
      assertNonNegative(piece.flowM3s, 'flow.pieces.flowM3s', index);
      if (index > 0 && !((piece.fromM as number) > (pieces[index - 1] as { fromM: number }).fromM)) {
        throw new HydraulicsInputError('flow.pieces.fromM', 'must increase from piece to piece', index);
      }
    });
  }
}
