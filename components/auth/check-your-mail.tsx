/** What every "we mailed you a link" answer shows: the same words whether or not the address is known. */
export function CheckYourMail({ email, what }: { email: string; what: string }) {
  return (
    <div
      role="status"
      className="space-y-2 rounded-md border border-moss-100 bg-moss-50 px-3 py-3 text-sm text-moss-800"
    >
      <p className="font-medium">Check your mail</p>
      <p>
        If <strong>{email}</strong> can receive mail from us, a message is on its way with a link to {what}. The link
        works once.
      </p>
      <p className="text-xs">Nothing after a few minutes? Look in the spam folder, or ask again.</p>
    </div>
  );
}
