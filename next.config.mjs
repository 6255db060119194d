/** @type {import('next').NextConfig} */
const nextConfig = {
  poweredByHeader: false,
  // Native and Node-only packages stay out of the bundle and load at run time.
  serverExternalPackages: ['sequelize', 'pg', 'pg-hstore', 'argon2', 'pdfkit', 'svg-to-pdfkit', 'piscina', 'esbuild', 'pino', 'rate-limiter-flexible', 'graphile-worker', 'nodemailer', 'sharp', 'exifr'],
};

export default nextConfig;
