'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function LineError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="This line" reset={reset} />;
}
