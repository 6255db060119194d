'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function RouteImportError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="The survey import" reset={reset} />;
}
