import type { PipeSpec } from '../catalogue/pipe-spec';
import { findPipe } from '../catalogue/index';
import { HydraulicsInputError } from '../errors';
import type { LineStretch } from './types';

/**
 * Looks up the pipe of every stretch: an inline PipeSpec is used as given; an id is searched in
 * the line's own pipes first, then in the catalogue. Throws `stretches.pipe[i]` for an unknown id.
 */
export function resolveStretchPipes(
  stretches: readonly LineStretch[],
  customPipes: readonly PipeSpec[] = [],
): PipeSpec[] {
  return stretches.map((stretch, index) => {
    if (typeof stretch.pipe !== 'string') return stretch.pipe;
    const id = stretch.pipe;
    const pipe = customPipes.find((p) => p.id === id) ?? findPipe(id);
    if (!pipe) throw new HydraulicsInputError('stretches.pipe', `unknown pipe id "${id}"`, index);
    return pipe;
  });
}
