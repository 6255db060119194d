'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function NetworkError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="The network" reset={reset} />;
}
