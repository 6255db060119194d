// Next.js calls register() once when a server instance starts.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { finishAcceptedRequestsOnClose } = await import('./lib/server/finish-accepted-requests');
  finishAcceptedRequestsOnClose();
}
