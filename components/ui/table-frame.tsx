import type { ReactNode } from 'react';

/**
 * The sideways-scrolling frame around every table: a labelled region that takes keyboard focus, so a
 * keyboard user can scroll a table wider than a phone (WCAG 2.1.1).
 */
export function ScrollFrame({
  label,
  dense = false,
  children,
}: {
  label: string;
  dense?: boolean;
  children: ReactNode;
}) {
  return (
    <div
      role="region"
      aria-label={label}
      tabIndex={0}
      className={`relative overflow-x-auto border border-creek-100 bg-white focus:outline-none focus-visible:ring-2 focus-visible:ring-creek-500 ${dense ? 'rounded-md' : 'rounded-lg'}`}
    >
      {children}
    </div>
  );
}

/**
 * The frame every list table shares: scrolls sideways on a phone (relative, so screen-reader-only
 * text inside cannot widen the page) with Runnel's header row. `head` is the header cells.
 */
export function TableFrame({
  head,
  children,
  label = 'Table',
}: {
  head: ReactNode;
  children: ReactNode;
  label?: string;
}) {
  return (
    <ScrollFrame label={label}>
      <table className="w-full text-left text-sm">
        <thead className="bg-creek-50 text-creek-800">
          <tr>{head}</tr>
        </thead>
        <tbody>{children}</tbody>
      </table>
    </ScrollFrame>
  );
}

/** A plain header cell. */
export function HeadCell({ children }: { children: ReactNode }) {
  return (
    <th scope="col" className="px-4 py-2 font-medium">
      {children}
    </th>
  );
}
