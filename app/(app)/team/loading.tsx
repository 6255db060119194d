import { Skeleton } from '@/components/ui/panel';

export default function Loading() {
  return (
    <div className="space-y-3" aria-busy="true" aria-label="Loading team">
      <Skeleton className="h-8 w-56" />
      {[0, 1, 2, 3].map((i) => (
        <Skeleton key={i} className="h-10 w-full" />
      ))}
    </div>
  );
}
