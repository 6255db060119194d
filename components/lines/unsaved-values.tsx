'use client';

import { createContext, useCallback, useContext, useEffect, useState } from 'react';

type Report = (id: string, label: string | null) => void;

const UnsavedValues = createContext<Report | null>(null);

/** Wrap an editor with `value={useUnsavedValues().report}`. */
export const UnsavedValuesProvider = UnsavedValues.Provider;

/**
 * Boxes of an editor that hold a value the editor did not take (refused, or still to be typed), so
 * the save state never says "saved" beside them. Each box reports itself by id; outside an editor
 * that listens, reporting does nothing.
 */
export function useUnsavedValues() {
  const [held, setHeld] = useState<ReadonlyMap<string, string>>(new Map());
  const report = useCallback<Report>((id, label) => {
    setHeld((current) => {
      if ((current.get(id) ?? null) === label) return current;
      const next = new Map(current);
      if (label === null) next.delete(id);
      else next.set(id, label);
      return next;
    });
  }, []);
  return { labels: [...held.values()], report };
}

/** Reports this box as holding a value not taken (label) or not (null), and clears it when the box goes. */
export function useReportUnsaved(id: string, label: string | null): void {
  const report = useContext(UnsavedValues);
  useEffect(() => {
    report?.(id, label);
    return () => report?.(id, null);
  }, [report, id, label]);
}
