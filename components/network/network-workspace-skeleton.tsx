import { Skeleton } from '@/components/ui/panel';
import { TableSkeleton } from '@/components/ui/widget-skeletons';

/** The network page's shape while it loads: the answers, the schematic, the tables of parts. */
export function NetworkWorkspaceSkeleton() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading the network">
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        {[0, 1, 2, 3].map((i) => (
          <Skeleton key={i} className="h-20" />
        ))}
      </div>
      <Skeleton className="h-80 w-full" />
      <TableSkeleton label="Loading the network's parts" />
    </div>
  );
}
