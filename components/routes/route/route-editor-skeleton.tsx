import { Skeleton } from '@/components/ui/panel';
import { TableSkeleton } from '@/components/ui/widget-skeletons';

/** The route page's shape while it loads: name and figures, the ground profile beside the plan, the points table. */
export function RouteEditorSkeleton() {
  return (
    <div className="space-y-5" aria-busy="true" aria-label="Loading the route">
      <Skeleton className="h-8 w-72" />
      <div className="grid gap-3 sm:grid-cols-5">
        {[0, 1, 2, 3, 4].map((i) => (
          <Skeleton key={i} className="h-10" />
        ))}
      </div>
      <div className="grid gap-3 xl:grid-cols-[minmax(0,1fr)_322px]">
        <Skeleton className="h-72 w-full" />
        <Skeleton className="hidden h-72 w-full xl:block" />
      </div>
      <TableSkeleton label="Loading the route's points" rows={5} />
    </div>
  );
}
