import http from 'node:http';
import net from 'node:net';

const PATCHED = Symbol.for('runnel.closeKeepAliveOnStop');

/**
 * How an instance stops without failing a request. On SIGTERM Next.js calls `server.close()`,
 * where Node stops listening, lets requests in flight finish, but also drops idle keep-alive
 * connections at once, racing a load balancer that is just sending a request down one of them
 * (it sees a reset: a 502 for a POST, which it must not retry), and keeps serving further requests
 * on busy connections, so under traffic the instance never stops.
 *
 * Here `close()` only stops listening (new connections are refused, so the balancer goes to the
 * other instances), and every answer from then on says `Connection: close`, so each connection
 * ends after the request it carries. An idle connection is left for its owner to close (nginx's
 * upstream `keepalive_timeout` is set below Node's 5 s for that) or to use once more; the server
 * has stopped when the last connection has gone.
 */
export function closeKeepAliveOnStop(): void {
  const proto = http.Server.prototype as http.Server & { [PATCHED]?: true };
  if (proto[PATCHED]) return;
  proto[PATCHED] = true;
  proto.close = function closeWithoutDroppingConnections(this: http.Server, callback?: (error?: Error) => void) {
    // First in line, so the header is set before any handler can start answering.
    this.prependListener('request', (_req: http.IncomingMessage, res: http.ServerResponse) => {
      if (!res.headersSent) res.setHeader('Connection', 'close');
    });
    net.Server.prototype.close.call(this, callback);
    return this;
  };
}
