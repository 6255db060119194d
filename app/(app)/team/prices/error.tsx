'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function PricesError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="The price list" reset={reset} />;
}
