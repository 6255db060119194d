import { describe, expect, it } from 'vitest';
import { AppError } from '@/lib/errors';
import { SurveyImportError } from '@/lib/survey/errors';
import { runInWorker } from '@/lib/workers/pool';

const gpsOptions = {
  format: 'gps-csv',
  name: 'Walk',
  mapping: { latitude: 0, longitude: 1, elevation: 2, time: null, name: null, accuracy: null },
  elevationUnit: 'm',
  heightSource: 'gps',
} as const;

describe('the worker pool', () => {
  it('runs a task on another thread and returns its value', async () => {
    expect(await runInWorker('test.spin', { ms: 1, answer: 42 })).toBe(42);
  }, 60_000);

  it('keeps the calling thread free while a task burns CPU', async () => {
    const task = runInWorker('test.spin', { ms: 600, answer: 1 });
    const asked = Date.now();
    await new Promise((resolve) => setTimeout(resolve, 20));
    const waitedMs = Date.now() - asked;
    expect(waitedMs).toBeLessThan(200);
    expect(await task).toBe(1);
  });

  it('stops a task at its time limit and says so (422)', async () => {
    const started = Date.now();
    const error = await runInWorker('test.spin', { ms: 10_000, answer: 0 }, { timeLimitMs: 300 }).catch(
      (e: unknown) => e,
    );
    expect(error).toBeInstanceOf(AppError);
    expect((error as AppError).status).toBe(422);
    expect(Date.now() - started).toBeLessThan(3000);
    // the pool still works after a thread was stopped
    expect(await runInWorker('test.spin', { ms: 1, answer: 7 })).toBe(7);
  });

  it('gives back a survey refusal as its own class, with its line and code', async () => {
    const bytes = new TextEncoder().encode('lat,lon,ele\n52.1,-1.2,100\n52.2,x,101\n');
    const error = await runInWorker('survey.parse', {
      bytes,
      fileName: 'walk.csv',
      options: gpsOptions as never,
      routeId: '00000000-0000-4000-8000-000000000000',
    }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(SurveyImportError);
    expect((error as SurveyImportError).code).toBe('not-a-number');
    expect((error as SurveyImportError).line).toBe(3);
  });

  it('gives back any other failure as a plain Error with its message', async () => {
    const error = await runInWorker('test.fail', { message: 'boom' }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Error);
    expect((error as Error).message).toBe('boom');
  });
});
