'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function RevisionError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="This revision" reset={reset} />;
}
