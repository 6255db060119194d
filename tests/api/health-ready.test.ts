import { afterEach, describe, expect, it, vi } from 'vitest';
import { GET as health } from '@/app/api/health/route';
import { GET as ready } from '@/app/api/ready/route';
import { db } from '@/lib/db';
import { call } from '../support/api';

describe('health and readiness', () => {
  afterEach(() => vi.restoreAllMocks());

  it('health answers 200 without touching the database', async () => {
    const query = vi.spyOn(db(), 'query');
    const res = await call(health, { method: 'GET', path: '/api/health' });
    expect(res.status).toBe(200);
    expect(res.json.status).toBe('ok');
    expect(query).not.toHaveBeenCalled();
  });

  it('ready answers 200 when every migration has run', async () => {
    const res = await call(ready, { method: 'GET', path: '/api/ready' });
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ status: 'ready', pendingMigrations: 0 });
  });

  it('ready answers 503 with Retry-After, and no driver text, when the database cannot be reached', async () => {
    vi.spyOn(db(), 'query').mockRejectedValueOnce(new Error('connect ECONNREFUSED 127.0.0.1:5505'));
    const res = await call(ready, { method: 'GET', path: '/api/ready' });
    expect(res.status).toBe(503);
    expect(res.headers.get('retry-after')).toBe('5');
    expect(res.text).not.toMatch(/ECONNREFUSED|5505/);
  });

  it('ready answers 503 when a migration has not run', async () => {
    vi.spyOn(db(), 'query').mockResolvedValueOnce([{ name: '20261201000001-create-teams.cjs' }] as never);
    const res = await call(ready, { method: 'GET', path: '/api/ready' });
    expect(res.status).toBe(503);
    expect(res.json.error.message).toMatch(/migration\(s\) have not run/);
  });
});
