import { describe, expect, it } from 'vitest';
import { live } from './live';

function directives(policy: string): Map<string, string> {
  return new Map(
    policy
      .split(';')
      .map((d) => d.trim())
      .filter(Boolean)
      .map((d) => [d.split(/\s+/)[0]!, d.slice(d.indexOf(' ') + 1)]),
  );
}

describe('security headers from the running app', () => {
  it('every HTML page has a Content Security Policy with a fresh nonce that its scripts carry', async () => {
    const first = await live('/sign-in');
    const second = await live('/sign-in');
    expect(first.status).toBe(200);
    const policy = first.headers.get('content-security-policy')!;
    expect(policy).toBeTruthy();
    const d = directives(policy);
    expect(d.get('object-src')).toBe(`'none'`);
    expect(d.get('frame-ancestors')).toBe(`'none'`);
    const nonce = /'nonce-([^']+)'/.exec(d.get('script-src')!)![1]!;
    const secondNonce = /'nonce-([^']+)'/.exec(second.headers.get('content-security-policy')!)![1];
    expect(secondNonce).not.toBe(nonce);
    const scripts = [...first.text.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
  });

  it('pages and API answers carry nosniff, a referrer policy, no X-Powered-By; API answers are no-store', async () => {
    for (const pathName of ['/sign-in', '/api/health', '/api/teams']) {
      const res = await live(pathName);
      expect(res.headers.get('x-content-type-options')).toBe('nosniff');
      expect(res.headers.get('referrer-policy')).toBe('strict-origin-when-cross-origin');
      expect(res.headers.get('x-powered-by')).toBeNull();
    }
    expect((await live('/api/health')).headers.get('cache-control')).toBe('no-store');
    expect((await live('/api/teams')).headers.get('cache-control')).toBe('no-store');
  });

  it('sends HSTS only when the request came over https', async () => {
    expect((await live('/sign-in')).headers.get('strict-transport-security')).toBeNull();
    const https = await live('/sign-in', { headers: { 'x-forwarded-proto': 'https' } });
    expect(https.headers.get('strict-transport-security')).toMatch(/max-age=\d+/);
  });

  it('health and readiness answer', async () => {
    expect((await live('/api/health')).status).toBe(200);
    const ready = await live('/api/ready');
    expect(ready.status).toBe(200);
    expect(ready.json.status).toBe('ready');
  });
});
