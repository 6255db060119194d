// Next.js calls register() once when the server starts: the mail job worker runs beside the app.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { env } = await import('./lib/env');
  if (env().RUNNEL_JOB_WORKER === 'off') return;
  const { startJobWorker } = await import('./lib/jobs/worker');
  await startJobWorker();
}
