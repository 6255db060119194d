'use client';

import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { analyzeLine, HydraulicsInputError, type LineAnalysis } from '@/hydraulics/index';
import type { LineRecord } from '@/lib/data/lines';
import { record, redo, startHistory, undo, type History } from '@/lib/lines/history';
import { lineInputOf } from '@/lib/lines/line-input';
import type { LineSiteContext } from '@/lib/lines/ram-start';
import type { LineRouteStation } from '@/lib/lines/route-stations';
import { ApiError } from '@/lib/queries/fetch-json';
import { useUpdateLine } from '@/lib/queries/lines';
import { inputErrorText } from '@/lib/lines/input-error-words';
import { LINE_DESIGN_WORDS } from '@/lib/validations/field-word-tables';
import { issuesText } from '@/lib/validations/field-words';
import { LineDesignSchema, type LineDesign } from '@/lib/validations/line-design';

export type SaveState = 'saved' | 'pending' | 'saving' | 'failed' | 'conflict';
const SAVE_DELAY_MS = 500;

function analyse(
  design: LineDesign,
  stations: readonly LineRouteStation[],
  context: LineSiteContext,
): { analysis: LineAnalysis } | { error: string } {
  try {
    return { analysis: analyzeLine(lineInputOf(design, stations, context)) };
  } catch (error) {
    // The core's refusal in the screen's words and the project's units, never its internal field path.
    if (error instanceof HydraulicsInputError) return { error: inputErrorText(error, context.unitSystem ?? 'metric') };
    throw error;
  }
}

/**
 * The line being edited: an undoable draft analysed in the browser with the engineering core on
 * every change, saved through the API shortly after the last change. A change that the schema or
 * the core refuses is not taken; its reason is returned for the form to show.
 */
export function useLineDraft(
  line: LineRecord,
  stations: readonly LineRouteStation[],
  context: LineSiteContext,
  canEdit: boolean,
) {
  const [history, setHistory] = useState<History<LineDesign>>(() => startHistory(line.design));
  const [saveState, setSaveState] = useState<SaveState>('saved');
  const [saveError, setSaveError] = useState<string | null>(null);
  const revision = useRef(line.revision);
  const [shownRevision, setShownRevision] = useState(line.revision);
  const savedDesign = useRef(line.design);
  const update = useUpdateLine(line.id);
  const design = history.present;

  const result = useMemo(() => analyse(design, stations, context), [design, stations, context]);

  const change = useCallback(
    (next: LineDesign, label: string): string | null => {
      if (!canEdit) return 'Your role can view this line but not change it';
      const parsed = LineDesignSchema.safeParse(next);
      if (!parsed.success) return issuesText(parsed.error, context.unitSystem ?? 'metric', LINE_DESIGN_WORDS);
      const checked = analyse(parsed.data, stations, context);
      if ('error' in checked) return checked.error;
      setHistory((h) => record(h, parsed.data, label));
      return null;
    },
    [canEdit, stations, context],
  );

  useEffect(() => {
    if (!canEdit || saveState === 'conflict') return;
    if (design === savedDesign.current) {
      setSaveState('saved');
      return;
    }
    setSaveState('pending');
    const timer = setTimeout(async () => {
      setSaveState('saving');
      try {
        const saved = await update.mutateAsync({ design, baseRevision: revision.current });
        savedDesign.current = design;
        revision.current = saved.revision;
        setShownRevision(saved.revision);
        setSaveError(null);
        setSaveState('saved');
      } catch (error) {
        const conflict = error instanceof ApiError && error.status === 409;
        setSaveError(error instanceof Error ? error.message : 'Not saved');
        setSaveState(conflict ? 'conflict' : 'failed');
      }
    }, SAVE_DELAY_MS);
    return () => clearTimeout(timer);
    // `update` changes identity each render; saving depends only on the design.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [design, canEdit]);

  /** After a details save elsewhere on the page, the next design save starts from the new revision. */
  const adoptRevision = useCallback((next: number) => {
    revision.current = next;
    setShownRevision(next);
  }, []);

  return {
    design,
    result,
    change,
    undo: () => setHistory(undo),
    redo: () => setHistory(redo),
    canUndo: history.past.length > 0,
    canRedo: history.future.length > 0,
    undoLabel: history.label,
    redoLabel: history.future[0]?.label ?? null,
    saveState,
    saveError,
    revision: shownRevision,
    revisionRef: revision,
    adoptRevision,
  };
}
