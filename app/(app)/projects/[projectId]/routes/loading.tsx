import { Skeleton } from '@/components/ui/panel';

export default function Loading() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading survey routes">
      <Skeleton className="h-8 w-56" />
      <Skeleton className="h-40 w-full" />
    </div>
  );
}
