'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function TeamError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="The team page" reset={reset} />;
}
