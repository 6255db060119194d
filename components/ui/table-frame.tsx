import type { ReactNode } from 'react';

/**
 * The frame every list table shares: scrolls sideways on a phone (relative, so screen-reader-only
 * text inside cannot widen the page) with Runnel's header row. `head` is the header cells.
 */
export function TableFrame({ head, children }: { head: ReactNode; children: ReactNode }) {
  return (
    <div className="relative overflow-x-auto rounded-lg border border-creek-100 bg-white">
      <table className="w-full text-left text-sm">
        <thead className="bg-creek-50 text-creek-800">
          <tr>{head}</tr>
        </thead>
        <tbody>{children}</tbody>
      </table>
    </div>
  );
}

/** A plain header cell. */
export function HeadCell({ children }: { children: ReactNode }) {
  return <th scope="col" className="px-4 py-2 font-medium">{children}</th>;
}
