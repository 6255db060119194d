import { assertPipeSpec } from '../catalogue/guard';
import type { PipeSpec } from '../catalogue/pipe-spec';
import { resolveStretchPipes } from './resolve-pipes';
import type { LineInput, LineStretch } from './types';
import { assertArray, assertRecord } from './validate/numbers';
import { assertDevices, assertEnd, assertFittings, assertFlow, assertStart } from './validate/parts';
import { assertSettings } from './validate/settings';
import { assertStations } from './validate/stations';
import { assertStretches } from './validate/stretches';

/**
 * Checks a line analysis input and throws `HydraulicsInputError` naming the field and index of the
 * first problem: fewer than two stations, non-increasing chainage, NaN or infinite numbers,
 * negative lengths, covers or diameters, stretches that leave a gap or overlap, an unknown pipe id,
 * devices or fittings off the line, settings out of range. Plain code (no schema library) so the
 * core stays standalone; the app validates its own boundary with zod before calling it.
 */
export function assertLineInput(input: unknown): asserts input is LineInput {
  assertRecord(input, 'input');
  assertStations(input.stations);
  const stations = input.stations as LineInput['stations'];
  const firstM = stations[0].chainageM;
  const lastM = stations[stations.length - 1].chainageM;
  if (input.pipes !== undefined) {
    assertArray(input.pipes, 'pipes');
    input.pipes.forEach((pipe, i) => assertPipeSpec(pipe, 'pipes', i));
  }
  assertStretches(input.stretches, firstM, lastM);
  resolveStretchPipes(input.stretches as readonly LineStretch[], input.pipes as readonly PipeSpec[] | undefined);
  assertFittings(input.fittings, firstM, lastM);
  assertDevices(input.devices, firstM, lastM);
  assertStart(input.start);
  assertEnd(input.end);
  assertFlow(input.flow);
  assertSettings(input.settings);
}
