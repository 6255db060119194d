/** A failed load, said plainly, with a retry. */
export function LoadError({ what, onRetry }: { what: string; onRetry: () => void }) {
  return (
    <p role="alert" className="text-sm text-clay-700">
      {what} could not be loaded.{' '}
      <button type="button" className="underline" onClick={onRetry}>
        Try again
      </button>
    </p>
  );
}
