/** Where focus was before a dialog or a removal, and the page around it, nearest first. */
export interface FocusMemory {
  target: HTMLElement | null;
  ancestors: HTMLElement[];
}

export function rememberFocus(from: Element | null = typeof document === 'undefined' ? null : document.activeElement): FocusMemory {
  const target = from instanceof HTMLElement && from !== document.body ? from : null;
  const ancestors: HTMLElement[] = [];
  for (let node = target?.parentElement ?? null; node && node !== document.body; node = node.parentElement) ancestors.push(node);
  return { target, ancestors };
}

/**
 * Focus back where it was; when that control is gone (its row was removed), the nearest enclosing
 * part of the page that is still there takes focus (made focusable for this, not put in the tab order),
 * so the next Tab continues from the same place instead of the top of the page.
 */
export function restoreFocus(memory: FocusMemory | null): void {
  if (!memory) return;
  if (memory.target?.isConnected && !(memory.target as HTMLButtonElement).disabled) {
    memory.target.focus();
    return;
  }
  const kept = memory.ancestors.find((node) => node.isConnected);
  if (!kept) return;
  if (!kept.hasAttribute('tabindex')) kept.setAttribute('tabindex', '-1');
  kept.focus();
}
