'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function ActivityError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="The activity of this project" reset={reset} />;
}
