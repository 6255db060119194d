import http from 'node:http';
import net from 'node:net';
import { describe, expect, it } from 'vitest';
import { finishAcceptedRequestsOnClose } from '@/lib/server/finish-accepted-requests';

/** Sends one raw request and resolves with what came back (or the socket error's code). */
function rawRequest(port: number, onWritten: () => void): Promise<string> {
  return new Promise((resolve) => {
    const socket = net.connect(port, '127.0.0.1', () => {
      socket.write('POST /readings HTTP/1.0\r\nHost: x\r\nContent-Length: 2\r\n\r\n{}');
      onWritten();
    });
    let answer = '';
    socket.on('data', (d) => (answer += d));
    socket.on('end', () => resolve(answer));
    socket.on('error', (e: NodeJS.ErrnoException) => resolve(`error ${e.code}`));
  });
}

describe('finishAcceptedRequestsOnClose', () => {
  it('answers a request accepted just before the server was told to close, then closes', async () => {
    finishAcceptedRequestsOnClose();
    let handled = 0;
    const server = http.createServer((req, res) => {
      req.resume();
      req.on('end', () => setTimeout(() => res.end(`stored ${++handled}`), 50));
    });
    // Close while the connection is open but its request not yet parsed: the case a balancer hits.
    server.on('connection', () => server.close());
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.address() as net.AddressInfo;
    const closed = new Promise<void>((resolve) => server.once('close', resolve));

    const answer = await rawRequest(port, () => undefined);

    expect(answer).toMatch(/^HTTP\/1\.1 200/);
    expect(answer).toContain('stored 1');
    await closed;
    // Not listening any more: a new connection is refused (the balancer then tries another instance).
    expect(await rawRequest(port, () => undefined)).toBe('error ECONNREFUSED');
  });
});
