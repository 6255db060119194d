'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function LinesError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="The lines of this project" reset={reset} />;
}
