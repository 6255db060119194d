/** A task is overdue when it is still open after its due date (ISO dates compare as text). */
export function isOverdue(task: { done: boolean; dueOn: string }, todayIso: string): boolean {
  return !task.done && task.dueOn < todayIso;
}

/** Today's date in the project's time zone, ISO yyyy-mm-dd (sv-SE formats dates as ISO). */
export function todayIn(timeZone: string | undefined, now: Date = new Date()): string {
  return new Intl.DateTimeFormat('sv-SE', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(now);
}
