import { TableSkeleton } from '@/components/ui/widget-skeletons';

export function ProjectsTableSkeleton() {
  return <TableSkeleton label="Loading projects" heading />;
}
