import { LiftWorkspaceSkeleton } from '@/components/lift/lift-workspace-skeleton';

export default function Loading() {
  return <LiftWorkspaceSkeleton />;
}
