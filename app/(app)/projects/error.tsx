'use client';

import { SegmentError } from '@/components/ui/segment-error';

export default function ProjectsError({ reset }: { error: Error; reset: () => void }) {
  return <SegmentError what="The projects list" reset={reset} />;
}
