'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function AppError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="This page" reset={reset} />;
}
