/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite loads its WebAssembly and data files by URL at run time: bundling it breaks those paths.
  serverExternalPackages: ['@electric-sql/pglite', 'pglite-prisma-adapter', '@react-pdf/renderer', 'pdfkit'],
  // Nameplate and damage photos go through server actions (5 MB each, a few at a time).
  experimental: { serverActions: { bodySizeLimit: '32mb' } },
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
