import { Skeleton } from '@/components/ui/panel';

export default function Loading() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading route">
      <Skeleton className="h-8 w-72" />
      <Skeleton className="h-16 w-full" />
      <Skeleton className="h-64 w-full" />
      <Skeleton className="h-80 w-full" />
    </div>
  );
}
