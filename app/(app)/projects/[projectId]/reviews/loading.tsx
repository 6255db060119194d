import { Skeleton } from '@/components/ui/panel';

export default function Loading() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading reviews">
      <Skeleton className="h-8 w-40" />
      <Skeleton className="h-24 w-full" />
      <Skeleton className="h-64 w-full" />
    </div>
  );
}
