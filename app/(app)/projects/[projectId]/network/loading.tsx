import { Skeleton } from '@/components/ui/panel';

export default function Loading() {
  return (
    <div className="space-y-5" aria-busy="true">
      <Skeleton className="h-8 w-40" />
      <Skeleton className="h-[420px] w-full" />
      <Skeleton className="h-48 w-full" />
    </div>
  );
}
