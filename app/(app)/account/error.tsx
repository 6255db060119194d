'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function AccountError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="Your account page" reset={reset} />;
}
