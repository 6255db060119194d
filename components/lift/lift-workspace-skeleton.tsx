import { Skeleton } from '@/components/ui/panel';

/** The lift page's shape while it loads: the answer cards, then the sections. */
export function LiftWorkspaceSkeleton() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading lift and storage">
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        {[0, 1, 2, 3].map((key) => (
          <Skeleton key={key} className="h-20" />
        ))}
      </div>
      <Skeleton className="h-48 w-full" />
      <Skeleton className="h-40 w-full" />
      <Skeleton className="h-40 w-full" />
    </div>
  );
}
