/** @type {import('next').NextConfig} */
const nextConfig = {
  // Separate build folders let several builds (CI, a dev server, a test run) share one checkout.
  distDir: process.env.NEXT_DIST_DIR || '.next',
  serverExternalPackages: ['sequelize', 'pg', 'pg-hstore', 'sharp', 'pdf-parse'],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
