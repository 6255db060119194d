import http from 'node:http';
import net from 'node:net';

const PATCHED = Symbol.for('runnel.finishAcceptedRequests');

/**
 * How an instance stops without failing a request. On SIGTERM Next.js calls `server.close()`,
 * which in Node also drops every connection that has no parsed request yet: under load that
 * includes connections a load balancer has just opened and written a request to, which then see
 * a reset (a 502 for the caller, and a POST the balancer must not retry). Here `close()` stops
 * listening only (new connections are refused, so the balancer sends them elsewhere), lets what
 * was accepted be read and answered, and ends idle keep-alive connections once a second until
 * none is left; Next.js exits when the server has closed.
 */
export function finishAcceptedRequestsOnClose(): void {
  const proto = http.Server.prototype as http.Server & { [PATCHED]?: true };
  if (proto[PATCHED]) return;
  proto[PATCHED] = true;
  proto.close = function close(this: http.Server, callback?: (error?: Error) => void) {
    net.Server.prototype.close.call(this, callback);
    const sweep = setInterval(() => this.closeIdleConnections(), 1000);
    sweep.unref();
    this.once('close', () => clearInterval(sweep));
    return this;
  };
}
