/** An undo history of whole values: what was, what is, what was undone. */
export interface History<T> {
  past: { value: T; label: string }[];
  present: T;
  /** Words for the change that made `present` (shown on the undo button). */
  label: string | null;
  future: { value: T; label: string }[];
}

const LIMIT = 100;

export function startHistory<T>(value: T): History<T> {
  return { past: [], present: value, label: null, future: [] };
}

/** Records a change; anything undone before it is dropped. */
export function record<T>(h: History<T>, value: T, label: string): History<T> {
  const past = [...h.past, { value: h.present, label: h.label ?? '' }].slice(-LIMIT);
  return { past, present: value, label, future: [] };
}

export function undo<T>(h: History<T>): History<T> {
  const previous = h.past[h.past.length - 1];
  if (!previous) return h;
  return {
    past: h.past.slice(0, -1),
    present: previous.value,
    label: previous.label || null,
    future: [{ value: h.present, label: h.label ?? '' }, ...h.future],
  };
}

export function redo<T>(h: History<T>): History<T> {
  const next = h.future[0];
  if (!next) return h;
  return {
    past: [...h.past, { value: h.present, label: h.label ?? '' }],
    present: next.value,
    label: next.label,
    future: h.future.slice(1),
  };
}
