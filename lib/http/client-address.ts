/**
 * The client's address as the trusted proxies saw it. Each trusted proxy in front of Runnel
 * appends the address it was reached from to X-Forwarded-For, so with N trusted proxies the
 * client is the N-th entry from the right; anything further left was written by the client and
 * is ignored. With no proxy (N = 0) Next.js fills the header from the socket only when the
 * client sent none, so the rightmost entry is used and a client can forge it: deployments put a
 * proxy in front and set RUNNEL_TRUSTED_PROXY_COUNT (see DEVELOPERS.md).
 */
export function clientAddress(forwardedFor: string | null | undefined, trustedProxyCount: number): string {
  const entries = (forwardedFor ?? '')
    .split(',')
    .map((e) => e.trim())
    .filter((e) => e.length > 0 && e.length <= 64);
  if (entries.length === 0) return 'unknown';
  const fromRight = Math.max(trustedProxyCount, 1);
  return entries[Math.max(entries.length - fromRight, 0)]!;
}
