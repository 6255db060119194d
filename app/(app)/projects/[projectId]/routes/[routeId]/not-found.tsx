import Link from 'next/link';

export default function RouteNotFound() {
  return (
    <div className="rounded-lg border border-creek-100 bg-white p-6">
      <h1 className="text-lg font-semibold text-creek-900">Route not found</h1>
      <p className="mt-1 text-sm text-creek-700">
        It may have been deleted or split, or it belongs to another project.
      </p>
      <Link href="/projects" className="mt-3 inline-block text-sm font-medium text-creek-600 underline">
        Back to projects
      </Link>
    </div>
  );
}
