'use client';

import { useSyncExternalStore, type ReactNode } from 'react';
import { currentDecimalMark, setProjectDecimalMark, subscribeDecimalMark } from '@/lib/units/decimal-mark-store';
import type { DecimalMark } from '@/lib/units/typed-number';

/** Makes the project's decimal mark (or the browser's, when it has none) the one number boxes read with. */
export function DecimalMarkScope({ mark, children }: { mark: DecimalMark | null; children: ReactNode }) {
  // Set during render so the boxes below read the right mark from their first commit; the server skips it.
  if (typeof window !== 'undefined') setProjectDecimalMark(mark);
  return children;
}

/** The decimal mark number boxes use; '.' while rendering on the server. */
export function useDecimalMark(): DecimalMark {
  return useSyncExternalStore(subscribeDecimalMark, currentDecimalMark, () => '.');
}
