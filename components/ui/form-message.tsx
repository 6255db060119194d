export function FormMessage({ message, tone = 'error' }: { message?: string | null; tone?: 'error' | 'ok' }) {
  if (!message) return null;
  const colours =
    tone === 'error' ? 'border-clay-100 bg-clay-50 text-clay-700' : 'border-moss-100 bg-moss-50 text-moss-700';
  return (
    <p role={tone === 'error' ? 'alert' : 'status'} className={`rounded-md border px-3 py-2 text-sm ${colours}`}>
      {message}
    </p>
  );
}
