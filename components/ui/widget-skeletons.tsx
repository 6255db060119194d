import { Skeleton } from './panel';

/**
 * Skeletons of the shapes the self-fetching widgets share, shown by their `<Suspense>` boundary and
 * by the widget itself until its first answer: a table (a header row and a few rows), a list of
 * items (comments, switches), a row of thumbnails. Widgets of their own shape (the lift page, the
 * line editor, the route page) keep a skeleton beside them built from the same `Skeleton`.
 */
export function TableSkeleton({
  label,
  rows = 3,
  heading = false,
}: {
  label: string;
  rows?: number;
  heading?: boolean;
}) {
  return (
    <div className="space-y-3" aria-busy="true" aria-label={label}>
      {heading && <Skeleton className="h-8 w-48" />}
      <Skeleton className="h-10 w-full" />
      {Array.from({ length: rows }, (_, i) => (
        <Skeleton key={i} className="h-12 w-full" />
      ))}
    </div>
  );
}

export function ListSkeleton({ label, items = 3 }: { label: string; items?: number }) {
  return (
    <div className="space-y-3" aria-busy="true" aria-label={label}>
      {Array.from({ length: items }, (_, i) => (
        <div key={i} className="flex items-start gap-3">
          <Skeleton className="h-5 w-5 shrink-0" />
          <div className="w-full space-y-1.5">
            <Skeleton className="h-4 w-1/3" />
            <Skeleton className="h-4 w-2/3" />
          </div>
        </div>
      ))}
    </div>
  );
}

export function ThumbnailsSkeleton({ label, count = 4 }: { label: string; count?: number }) {
  return (
    <div className="space-y-3" aria-busy="true" aria-label={label}>
      <Skeleton className="h-9 w-64" />
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        {Array.from({ length: count }, (_, i) => (
          <Skeleton key={i} className="aspect-[4/3] w-full" />
        ))}
      </div>
    </div>
  );
}
