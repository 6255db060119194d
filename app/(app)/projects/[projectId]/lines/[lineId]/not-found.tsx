import Link from 'next/link';

export default function LineNotFound() {
  return (
    <div className="space-y-2">
      <h1 className="text-xl font-semibold text-creek-900">No such line</h1>
      <p className="text-sm text-creek-700">
        It may have been deleted, or it belongs to another project.{' '}
        <Link href="../lines" className="underline">
          See the project&apos;s lines
        </Link>
        .
      </p>
    </div>
  );
}
