import { Skeleton } from '@/components/ui/panel';

export default function Loading() {
  return (
    <div className="max-w-2xl space-y-3" aria-busy="true" aria-label="Loading your account">
      <Skeleton className="h-8 w-56" />
      {[0, 1, 2, 3, 4].map((i) => (
        <Skeleton key={i} className="h-8 w-full" />
      ))}
      <Skeleton className="h-40 w-full" />
    </div>
  );
}
