import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="mx-auto max-w-lg px-4 py-16">
      <h1 className="text-xl font-semibold text-creek-900">Nothing here</h1>
      <p className="mt-2 text-sm text-creek-700">
        The page you asked for does not exist, or you do not have access to it.
      </p>
      <Link href="/projects" className="mt-4 inline-block text-sm font-medium text-creek-600 underline">
        Go to projects
      </Link>
    </main>
  );
}
