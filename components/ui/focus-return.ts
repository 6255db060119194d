/** Where focus was before a dialog or a removal, and the page around it, nearest first. */
export interface FocusMemory {
  target: HTMLElement | null;
  ancestors: HTMLElement[];
  /** When the control sat in a row of a list or table: the list, the row's place and the control's place in it. */
  row: { list: HTMLElement; index: number; control: number } | null;
}

const CONTROLS =
  'button:not([disabled]), a[href], input:not([disabled]), select:not([disabled]), textarea:not([disabled])';

export function rememberFocus(
  from: Element | null = typeof document === 'undefined' ? null : document.activeElement,
): FocusMemory {
  const target = from instanceof HTMLElement && from !== document.body ? from : null;
  const ancestors: HTMLElement[] = [];
  for (let node = target?.parentElement ?? null; node && node !== document.body; node = node.parentElement)
    ancestors.push(node);
  const rowElement = target?.closest('tr, li') as HTMLElement | null;
  const list = rowElement?.parentElement ?? null;
  const row =
    rowElement && list
      ? {
          list,
          index: [...list.children].indexOf(rowElement),
          control: [...rowElement.querySelectorAll(CONTROLS)].indexOf(target!),
        }
      : null;
  return { target, ancestors, row };
}

/**
 * Focus back where it was. When that control is gone: the same control of the row that took the
 * removed row's place (or the row before, when the last went), so a keyboard user can remove row
 * after row; else the nearest enclosing part of the page still there (made focusable for this, not
 * put in the tab order), so the next Tab continues from the same place instead of the top of the page.
 */
export function restoreFocus(memory: FocusMemory | null): void {
  if (!memory) return;
  if (memory.target?.isConnected && !(memory.target as HTMLButtonElement).disabled) {
    memory.target.focus();
    return;
  }
  if (memory.row?.list.isConnected && memory.row.control >= 0) {
    const rows = memory.row.list.children;
    const next = rows[Math.min(memory.row.index, rows.length - 1)];
    const control = next?.querySelectorAll<HTMLElement>(CONTROLS)[memory.row.control];
    if (control) {
      control.focus();
      return;
    }
  }
  const kept = memory.ancestors.find((node) => node.isConnected);
  if (!kept) return;
  if (!kept.hasAttribute('tabindex')) kept.setAttribute('tabindex', '-1');
  kept.focus();
}

/** How long after a dialog closes a late redraw may still take focus away from where it went back. */
const LATE_REDRAW_MS = 3000;

/**
 * Focus back where it was (as `restoreFocus`), and again whenever the page redraws with focus lost
 * (on the body) in the moments after: a confirmed removal can reach the page only after the dialog
 * has closed (the list is fetched again and redrawn), which would otherwise drop focus to the top
 * of the page. Stops at the user's next key or pointer press, so it never fights the user.
 */
export function restoreFocusThroughRedraw(memory: FocusMemory | null): void {
  if (!memory) return;
  restoreFocus(memory);
  const observer = new MutationObserver(() => {
    if (!document.activeElement || document.activeElement === document.body) restoreFocus(memory);
  });
  const stop = () => {
    observer.disconnect();
    window.clearTimeout(timer);
    document.removeEventListener('keydown', stop, true);
    document.removeEventListener('pointerdown', stop, true);
  };
  const timer = window.setTimeout(stop, LATE_REDRAW_MS);
  observer.observe(document.body, { childList: true, subtree: true });
  document.addEventListener('keydown', stop, true);
  document.addEventListener('pointerdown', stop, true);
}

/** Runs a removal started from `control` and keeps keyboard focus in its place once the page has redrawn. */
export function removeKeepingFocus(control: Element, remove: () => unknown): void {
  const memory = rememberFocus(control);
  remove();
  requestAnimationFrame(() => restoreFocus(memory));
}
