import { ProjectsTableSkeleton } from '@/components/projects/projects-table-skeleton';

export default function Loading() {
  return <ProjectsTableSkeleton />;
}
