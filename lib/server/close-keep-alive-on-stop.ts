import http from 'node:http';

const PATCHED = Symbol.for('runnel.closeKeepAliveOnStop');

/**
 * How an instance stops without failing a request. On SIGTERM Next.js calls `server.close()`:
 * Node stops listening, closes idle connections and lets requests in flight finish, but keeps
 * serving further requests that a load balancer sends down its open keep-alive connections, so
 * the instance would not stop while it has traffic. From `close()` on, every response also says
 * `Connection: close`, so each of those connections ends after the request it carries; the
 * balancer then reaches only the other instances (new connections here are refused).
 */
export function closeKeepAliveOnStop(): void {
  const proto = http.Server.prototype as http.Server & { [PATCHED]?: true };
  if (proto[PATCHED]) return;
  proto[PATCHED] = true;
  const close = proto.close;
  proto.close = function closeAndEndKeepAlive(this: http.Server, ...args: Parameters<http.Server['close']>) {
    this.on('request', (_req: http.IncomingMessage, res: http.ServerResponse) => {
      if (!res.headersSent) res.setHeader('Connection', 'close');
    });
    return close.apply(this, args);
  };
}
