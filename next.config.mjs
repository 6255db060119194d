// On every answer, pages and API alike (the per-request Content Security Policy is set in proxy.ts).
const COMMON_SECURITY_HEADERS = [
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=(self), payment=()' },
  { key: 'Cross-Origin-Opener-Policy', value: 'same-origin' },
];
// Only when the request came over https (directly or through the load balancer).
const HSTS_HEADER = { key: 'Strict-Transport-Security', value: 'max-age=31536000; includeSubDomains' };
/** @type {import('next').NextConfig} */
const nextConfig = {
  poweredByHeader: false,
  // Native and Node-only packages stay out of the bundle and load at run time.
  serverExternalPackages: [
    'sequelize',
    'pg',
    'pg-hstore',
    'argon2',
    'pdfkit',
    'svg-to-pdfkit',
    'piscina',
    'esbuild',
    'pino',
    'rate-limiter-flexible',
    'graphile-worker',
    'nodemailer',
    'sharp',
    'exifr',
  ],
  async headers() {
    return [
      { source: '/:path*', headers: COMMON_SECURITY_HEADERS },
      {
        source: '/:path*',
        has: [{ type: 'header', key: 'x-forwarded-proto', value: 'https' }],
        headers: [HSTS_HEADER],
      },
      // API answers are per user: never kept by a browser or a shared cache.
      { source: '/api/:path*', headers: [{ key: 'Cache-Control', value: 'no-store' }] },
    ];
  },
};

export default nextConfig;
