/**
 * The Content Security Policy of every HTML page. Scripts run only with this request's nonce (and
 * what those scripts load: 'strict-dynamic'); nothing may frame a page, plugins are off, forms post
 * only here. Styles allow inline because React style attributes cannot carry a nonce.
 */
export function contentSecurityPolicy(nonce: string, options: { development: boolean }): string {
  const scripts = [`'self'`, `'nonce-${nonce}'`, `'strict-dynamic'`, ...(options.development ? [`'unsafe-eval'`] : [])];
  return [
    `default-src 'self'`,
    `script-src ${scripts.join(' ')}`,
    `style-src 'self' 'unsafe-inline'`,
    `img-src 'self' data: blob:`,
    `font-src 'self'`,
    `connect-src 'self'`,
    `worker-src 'self' blob:`,
    `object-src 'none'`,
    `base-uri 'self'`,
    `form-action 'self'`,
    `frame-ancestors 'none'`,
  ].join('; ');
}

/** A fresh nonce per request: 128 random bits, base64. */
export function newNonce(): string {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return btoa(String.fromCharCode(...bytes));
}
