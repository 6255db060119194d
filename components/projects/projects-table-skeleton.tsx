import { Skeleton } from '@/components/ui/panel';

export function ProjectsTableSkeleton() {
  return (
    <div className="space-y-3" aria-busy="true" aria-label="Loading projects">
      <Skeleton className="h-8 w-48" />
      <Skeleton className="h-10 w-full" />
      {[0, 1, 2].map((i) => <Skeleton key={i} className="h-12 w-full" />)}
    </div>
  );
}
