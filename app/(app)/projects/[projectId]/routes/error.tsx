'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function RoutesError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="The survey routes of this project" reset={reset} />;
}
