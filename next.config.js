/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite loads its WebAssembly and data files by URL at run time: bundling it breaks those paths.
  serverExternalPackages: ['@electric-sql/pglite', 'pglite-prisma-adapter', '@react-pdf/renderer', 'pdfkit'],
  // Nameplate and damage photos go through server actions (5 MB each, a few at a time).
  experimental: { serverActions: { bodySizeLimit: '32mb' } },
  poweredByHeader: false,
  typedRoutes: false,
  // The as-found data sheet and the final tests moved from /sheet and /tests (names that were ambiguous with
  // the customer's job sheet and with test code); bookmarks and printed links keep working.
  async redirects() {
    return [
      { source: '/jobs/:number/sheet/:rest*', destination: '/jobs/:number/as-found/:rest*', permanent: true },
      { source: '/jobs/:number/tests', destination: '/jobs/:number/final-tests', permanent: true },
    ];
  },
};

export default nextConfig;
