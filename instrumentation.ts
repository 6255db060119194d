// Next.js calls register() once when a server instance starts: keep-alive closes on stop, and the
// mail job worker runs beside the app.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { closeKeepAliveOnStop } = await import('./lib/server/close-keep-alive-on-stop');
  closeKeepAliveOnStop();
  const { env } = await import('./lib/env');
  if (env().RUNNEL_JOB_WORKER === 'off') return;
  const { startJobWorker } = await import('./lib/jobs/worker');
  await startJobWorker();
}
