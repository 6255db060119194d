import http from 'node:http';
import type net from 'node:net';
import { describe, expect, it } from 'vitest';
import { closeKeepAliveOnStop } from '@/lib/server/close-keep-alive-on-stop';

/** One GET on the given keep-alive agent; resolves with the Connection header of the answer. */
function get(port: number, agent: http.Agent): Promise<string | undefined> {
  return new Promise((resolve, reject) => {
    http
      .get({ host: '127.0.0.1', port, path: '/', agent }, (res) => {
        res.resume();
        res.on('end', () => resolve(res.headers.connection));
      })
      .on('error', reject);
  });
}

describe('closeKeepAliveOnStop', () => {
  it('ends a busy keep-alive connection after its next answer once the server is closing, so the server can stop', async () => {
    closeKeepAliveOnStop();
    const server = http.createServer((_req, res) => setTimeout(() => res.end('ok'), 20));
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.address() as net.AddressInfo;
    const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });

    expect(await get(port, agent)).toBe('keep-alive');
    // A request in flight on the connection when the server is told to close, as under load.
    const inFlight = get(port, agent);
    await new Promise((resolve) => setTimeout(resolve, 5));
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    // Answered; the connection then carries a second request, which is answered with Connection: close.
    await inFlight;
    expect(await get(port, agent)).toBe('close');
    await closed;
    agent.destroy();
  });

  it('leaves an idle keep-alive connection open when closing: a request sent down it is answered, then it ends', async () => {
    closeKeepAliveOnStop();
    const server = http.createServer((_req, res) => res.end('ok'));
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.address() as net.AddressInfo;
    const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
    expect(await get(port, agent)).toBe('keep-alive');

    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    // The balancer's side of the race: a request on the pooled connection just after close().
    expect(await get(port, agent)).toBe('close');
    await closed;
    agent.destroy();
  });
});
