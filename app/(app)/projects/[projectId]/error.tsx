'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function ProjectError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="This project" reset={reset} />;
}
