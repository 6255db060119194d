'use client';

/** What a page segment shows when its server load fails: what failed, that nothing changed, and a retry. */
export function SegmentError({ what, reset }: { what: string; reset: () => void }) {
  return (
    <div role="alert" className="rounded-lg border border-clay-100 bg-clay-50 p-6">
      <h1 className="text-lg font-semibold text-clay-700">{what} could not be loaded</h1>
      <p className="mt-1 text-sm text-clay-700">Nothing was changed. It may be a passing problem with the server.</p>
      <button type="button" onClick={reset} className="mt-3 rounded-md bg-clay-700 px-3 py-1.5 text-sm text-white">
        Try again
      </button>
    </div>
  );
}
