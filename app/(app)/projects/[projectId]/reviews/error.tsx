'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function ReviewsError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="The revisions of this project" reset={reset} />;
}
