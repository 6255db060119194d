import Link from 'next/link';

export default function RevisionNotFound() {
  return (
    <div className="space-y-2">
      <h1 className="text-xl font-semibold text-creek-900">No such revision</h1>
      <p className="text-sm text-creek-700">
        It may not exist, or it is not approved yet and so not shown to clients.{' '}
        <Link href="../reviews" className="underline">
          See the revisions you can open
        </Link>
        .
      </p>
    </div>
  );
}
