'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function RevisionCompareError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="The revision comparison" reset={reset} />;
}
