'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function LiftError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="Lift and storage" reset={reset} />;
}
