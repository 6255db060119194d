// Next.js calls register() once when a server instance starts.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { closeKeepAliveOnStop } = await import('./lib/server/close-keep-alive-on-stop');
  closeKeepAliveOnStop();
}
