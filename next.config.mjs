/** @type {import('next').NextConfig} */
const nextConfig = {
  // `npm test` builds into its own folder so it never disturbs a running `npm start`.
  distDir: process.env.ANTINODE_DIST_DIR || '.next',
  serverExternalPackages: ['sequelize', 'pg', '@node-rs/argon2', 'sharp', 'piscina', 'rate-limiter-flexible'],
  poweredByHeader: false,
  reactStrictMode: true,
  typedRoutes: false,
};

export default nextConfig;
