// Extra origins allowed to post to server actions (a proxy that rewrites Host); the app's own host is
// always allowed. Checked with the other settings in lib/env.ts at start-up.
const allowedOrigins = (process.env.COILWRIGHT_ALLOWED_ORIGINS ?? '')
  .split(',')
  .map((s) => s.trim())
  .filter(Boolean);

/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite loads its WebAssembly and data files by URL at run time: bundling it breaks those paths.
  serverExternalPackages: ['@electric-sql/pglite', 'pglite-prisma-adapter', '@react-pdf/renderer', 'pdfkit'],
  // Nameplate and damage photos go through server actions (5 MB each, a few at a time).
  experimental: { serverActions: { bodySizeLimit: '32mb', ...(allowedOrigins.length ? { allowedOrigins } : {}) } },
  poweredByHeader: false,
  typedRoutes: false,
  // The as-found data sheet and the final tests moved from /sheet and /tests (names that were ambiguous with
  // the customer's job sheet and with test code); bookmarks and printed links keep working.
  // Pages get their CSP and the rest from proxy.ts; these cover everything else (assets, downloads).
  async headers() {
    return [
      {
        source: '/:path*',
        headers: [
          { key: 'X-Frame-Options', value: 'DENY' },
          { key: 'Referrer-Policy', value: 'same-origin' },
          { key: 'X-Content-Type-Options', value: 'nosniff' },
        ],
      },
    ];
  },
  async redirects() {
    return [
      { source: '/jobs/:number/sheet/:rest*', destination: '/jobs/:number/as-found/:rest*', permanent: true },
      { source: '/jobs/:number/tests', destination: '/jobs/:number/final-tests', permanent: true },
    ];
  },
};

export default nextConfig;
