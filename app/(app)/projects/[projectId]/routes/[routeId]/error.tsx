'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function RouteError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="This survey route" reset={reset} />;
}
