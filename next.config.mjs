const dev = process.env.NODE_ENV !== 'production';

// The 3D view needs blob: workers and data:/blob: textures; the dev server needs eval for fast refresh.
const csp = [
  "default-src 'self'",
  `script-src 'self' 'unsafe-inline'${dev ? " 'unsafe-eval'" : ''}`,
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self' data:",
  "connect-src 'self'",
  "worker-src 'self' blob:",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join('; ');

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Tests build into their own folder so a running `npm start` is not disturbed.
  distDir: process.env.NEXT_DIST_DIR || '.next',
  // esbuild (and esbuild-wasm, which @serwist/turbopack names) bundle the service worker at build time.
  serverExternalPackages: ['sequelize', 'sqlite3', 'pg', 'pg-hstore', 'umzug', 'nodemailer', 'bcryptjs', 'jimp', 'esbuild', 'esbuild-wasm', 'pdfkit'],
  poweredByHeader: false,
  async headers() {
    const common = [
      { key: 'X-Content-Type-Options', value: 'nosniff' },
      { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
      { key: 'X-Frame-Options', value: 'DENY' },
      { key: 'Permissions-Policy', value: 'camera=(self), geolocation=(), microphone=()' },
    ];
    return [
      // Attachments set their own stricter policy (default-src 'none'; sandbox); the site-wide one
      // must not replace it.
      { source: '/((?!api/attachments/).*)', headers: [{ key: 'Content-Security-Policy', value: csp }, ...common] },
      { source: '/api/attachments/:path*', headers: common },
    ];
  },
};
export default nextConfig;
