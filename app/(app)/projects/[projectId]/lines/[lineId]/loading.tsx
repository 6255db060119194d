import { LineEditorSkeleton } from '@/components/lines/line-editor';

export default function Loading() {
  return <LineEditorSkeleton />;
}
