'use client';

import type { LineAnalysis } from '@/hydraulics/index';
import { standaloneSvg } from '@/lib/chart/svg-node';
import type { LineRecord } from '@/lib/data/lines';
import { downloadText } from '@/lib/lines/download';
import { reportFileName } from '@/lib/lines/file-names';
import { lineReportUrl, svgExportScene, type ExaggerationSetting } from '@/lib/lines/profile-exports';
import { workingCopyStamp } from '@/lib/review/stamp';
import { formatQuantity, type DisplayUnits } from '@/lib/units';
import { useRouter } from 'next/navigation';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { useLineActions } from './line-actions';
import type { useLineDraft } from './use-line-draft';

const SAVE_WORDS = {
  saved: 'All changes saved',
  pending: 'Changes not saved yet…',
  saving: 'Saving…',
  failed: 'Not saved',
  conflict: 'Not saved: this line was saved elsewhere since this page opened it',
  refused: 'Not saved',
} as const;

/** Title, revision, save state, undo and the exports. */
export function LineHeader({
  line,
  projectName,
  units,
  draft,
  analysis,
  canEdit,
  notTaken = [],
  exaggeration = 'auto',
}: {
  line: LineRecord;
  projectName: string;
  units: DisplayUnits;
  draft: ReturnType<typeof useLineDraft>;
  analysis: LineAnalysis | null;
  canEdit: boolean;
  /** Boxes holding a value the editor refused or still waits for: not saved, whatever the save state. */
  notTaken?: readonly string[];
  /** The profile's vertical exaggeration setting on screen: the SVG and the PDF draw the same one. */
  exaggeration?: ExaggerationSetting;
}) {
  const c = analysis?.points.chainageM;
  // Saved only when the last save went through and no box holds a value that was not taken.
  const saveState = draft.saveState === 'saved' && notTaken.length > 0 ? 'refused' : draft.saveState;
  const saved = saveState === 'saved';
  const router = useRouter();
  const actions = useLineActions(line.projectId);
  const toRemove = {
    id: line.id,
    name: line.name,
    stretchCount: draft.design.stretches.length,
    deviceCount: draft.design.devices.length,
  };

  async function duplicate() {
    const made = await actions.copy(line);
    if (made) router.push(`/projects/${line.projectId}/lines/${made.id}`);
  }

  function exportSvg() {
    if (!analysis) return;
    const title = `${projectName}: ${line.name}, working copy`;
    const scene = svgExportScene(analysis, {
      units,
      devices: draft.design.devices,
      title,
      stamp: workingCopyStamp(line.preparedBy),
      exaggeration,
    });
    downloadText(standaloneSvg(scene.root), reportFileName(line.name, null, 'svg', 'profile'), 'image/svg+xml');
  }

  return (
    <header className="space-y-3">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold text-creek-900">{line.name}</h1>
          <p className="text-sm text-creek-700">
            Along {line.routeName ?? 'a removed route'}
            {c
              ? `, ch. ${formatQuantity('chainage', c[0], units.system)} to ${formatQuantity('chainage', c[c.length - 1], units.system)}`
              : ''}{' '}
            · working copy, save {draft.revision} · review and approval are on the project&apos;s{' '}
            <a className="underline" href={`/projects/${line.projectId}/reviews`}>
              Reviews
            </a>{' '}
            page
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          {canEdit && (
            <>
              <span
                role="status"
                data-testid="save-state"
                data-state={saveState}
                className={`text-xs ${saved || saveState === 'pending' || saveState === 'saving' ? 'text-creek-700' : 'font-medium text-clay-700'}`}
              >
                {SAVE_WORDS[saveState]}
                {saveState === 'refused'
                  ? `: ${notTaken.join('; ')} — the line keeps its saved values until then`
                  : draft.saveError && !saved
                    ? `: ${draft.saveError}`
                    : ''}
              </span>

              <Button
                tone="quiet"
                className="py-1 text-xs"
                disabled={!draft.canUndo}
                onClick={draft.undo}
                title={draft.undoLabel ? `Undo: ${draft.undoLabel}` : undefined}
              >
                Undo{draft.canUndo && draft.undoLabel ? `: ${draft.undoLabel}` : ''}
              </Button>
              <Button tone="quiet" className="py-1 text-xs" disabled={!draft.canRedo} onClick={draft.redo}>
                Redo
              </Button>
            </>
          )}
          {canEdit && (
            <>
              <Button
                tone="quiet"
                className="py-1 text-xs"
                onClick={() => void duplicate()}
                disabled={actions.copying || !line.routeId}
              >
                Duplicate
              </Button>
              <Button
                tone="quiet"
                className="py-1 text-xs text-clay-700"
                onClick={() => actions.askDelete(toRemove, () => router.push(`/projects/${line.projectId}/lines`))}
              >
                Delete
              </Button>
            </>
          )}
          <Button tone="quiet" className="py-1 text-xs" onClick={exportSvg} disabled={!analysis}>
            Profile as SVG
          </Button>
          {draft.saveState === 'saved' ? (
            <a
              href={lineReportUrl(line.id, exaggeration)}
              download={reportFileName(line.name, null, 'pdf')}
              className="inline-flex items-center rounded-md bg-creek-700 px-3.5 py-1 text-xs font-medium text-white hover:bg-creek-800"
            >
              PDF report
            </a>
          ) : (
            <span
              className="inline-flex items-center rounded-md bg-creek-300 px-3.5 py-1 text-xs font-medium text-white"
              title="The report is made from the saved line"
            >
              PDF report (saving…)
            </span>
          )}
        </div>
      </div>
      {actions.notice?.tone === 'error' && <FormMessage message={actions.notice.text} />}
      {canEdit && draft.saveState === 'conflict' && (
        // Shown where the person is working, not only in the header they may have scrolled away from.
        <div
          role="alert"
          data-testid="save-conflict"
          className="fixed inset-x-3 bottom-3 z-40 mx-auto flex max-w-3xl flex-wrap items-center gap-3 rounded-lg border border-clay-100 bg-white px-4 py-3 text-sm text-clay-700 shadow-lg"
        >
          <span className="min-w-0 flex-1">Not saved. {draft.saveError}</span>
          <Button tone="primary" className="py-1 text-xs" onClick={() => window.location.reload()}>
            Reload the saved line
          </Button>
          <span className="basis-full text-xs text-creek-700">
            Your last change on this page is not kept: make it again on the saved line.
          </span>
        </div>
      )}
      {actions.dialog}
    </header>
  );
}
