'use client';

import { useCallback, useEffect, useRef, useState, type ReactNode } from 'react';
import { Button } from './button';
import { FormMessage } from './form-message';
import { restoreFocusThroughRedraw, rememberFocus, type FocusMemory } from './focus-return';

export interface ConfirmRequest {
  title: string;
  /** What the action does and what goes with it, in plain words. */
  body: ReactNode;
  confirmLabel: string;
  tone?: 'danger' | 'primary';
  /** Runs on confirm; a thrown error is shown in the dialog, which stays open. */
  onConfirm: () => Promise<unknown> | unknown;
}

/**
 * The one way the app asks before a change that cannot be taken back. `ask(request)` opens a modal
 * dialog (the browser's own <dialog>: focus held inside, Escape cancels); when it closes, focus goes
 * back to the control that opened it or, when that control is gone (a removed row), to the nearest
 * part of the page still there, so keyboard users keep their place.
 */
export function useConfirm() {
  const [request, setRequest] = useState<ConfirmRequest | null>(null);
  const memory = useRef<FocusMemory | null>(null);
  const returning = useRef<FocusMemory | null>(null);
  const ask = useCallback((next: ConfirmRequest) => {
    memory.current = rememberFocus();
    setRequest(next);
  }, []);
  const close = useCallback(() => {
    returning.current = memory.current;
    memory.current = null;
    setRequest(null);
  }, []);
  // Once the dialog is off the page (while it is there, the page behind it cannot take focus);
  // again if what the action removed only goes later.
  useEffect(() => {
    if (request !== null || !returning.current) return;
    const remembered = returning.current;
    returning.current = null;
    restoreFocusThroughRedraw(remembered);
  }, [request]);
  const dialog = request ? <ConfirmDialog request={request} onClose={close} /> : null;
  return { ask, dialog };
}

function ConfirmDialog({ request, onClose }: { request: ConfirmRequest; onClose: () => void }) {
  const ref = useRef<HTMLDialogElement>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
  }, []);

  async function confirm() {
    setBusy(true);
    setError(null);
    try {
      await request.onConfirm();
      onClose();
    } catch (failure) {
      setError(failure instanceof Error ? failure.message : 'That did not work; nothing was changed.');
      setBusy(false);
    }
  }

  return (
    <dialog
      ref={ref}
      aria-labelledby="confirm-dialog-title"
      aria-describedby="confirm-dialog-body"
      onCancel={(event) => {
        event.preventDefault();
        if (!busy) onClose();
      }}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-lg border border-creek-200 bg-white p-0 text-creek-900 shadow-xl backdrop:bg-creek-950/40"
    >
      <div className="space-y-3 p-5">
        <h2 id="confirm-dialog-title" className="text-lg font-semibold">
          {request.title}
        </h2>
        <div id="confirm-dialog-body" className="space-y-2 text-sm text-creek-800">
          {request.body}
        </div>
        <FormMessage message={error} />
        <div className="flex flex-wrap justify-end gap-2 pt-1">
          <Button tone="quiet" autoFocus disabled={busy} onClick={onClose}>
            Cancel
          </Button>
          <Button tone={request.tone ?? 'danger'} disabled={busy} onClick={() => void confirm()}>
            {busy ? 'Working…' : request.confirmLabel}
          </Button>
        </div>
      </div>
    </dialog>
  );
}
