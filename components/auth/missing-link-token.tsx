import Link from 'next/link';

/** A link page opened without its token (a cut-off link). */
export function MissingLinkToken() {
  return (
    <div role="alert" className="space-y-2 text-sm text-creek-800">
      <h1 className="text-xl font-semibold text-creek-900">This link is incomplete</h1>
      <p>Open the link again from the mail, or copy all of it into the address bar.</p>
      <p>
        <Link className="font-medium text-creek-600 underline" href="/sign-in">
          Back to sign-in
        </Link>
      </p>
    </div>
  );
}
