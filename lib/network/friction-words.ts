import { FRICTION_WORDS } from '../lines/answers';
import type { RunFriction } from './run-result';

/** Which friction law a network run used, in the same words as a line's page (one wording for both). */
export function networkFrictionWords(friction: RunFriction | undefined): string {
  if (!friction)
    return 'Friction law not recorded for this run (it was solved before runs recorded it); run it again to see it.';
  const words = FRICTION_WORDS[friction.method];
  return friction.freeSurfaceLosses
    ? words
    : words.replace(/; velocity head and entrance loss.*$/, '; no entrance loss at free surfaces.');
}
