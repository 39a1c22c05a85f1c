/** @type {import('next').NextConfig} */
const nextConfig = {
  // `npm test` builds into its own folder so it never disturbs a running `npm start`.
  distDir: process.env.ANTINODE_DIST_DIR || '.next',
  serverExternalPackages: ['sequelize', 'pg', '@node-rs/argon2', 'sharp', 'piscina', 'rate-limiter-flexible', 'pg-boss'],
  poweredByHeader: false,
  reactStrictMode: true,
  typedRoutes: false,
  // Static files (scripts, styles, fonts, the icon): the headers pages and API answers get from
  // proxy.ts and the route wrapper that apply to a file (lib/http/security-headers.ts).
  async headers() {
    const headers = [
      { key: 'X-Content-Type-Options', value: 'nosniff' },
      { key: 'Referrer-Policy', value: 'same-origin' },
      { key: 'Cross-Origin-Resource-Policy', value: 'same-origin' },
      { key: 'X-Frame-Options', value: 'DENY' },
    ];
    return ['/_next/static/:path*', '/fonts/:path*', '/icon.svg', '/favicon.ico'].map((source) => ({ source, headers }));
  },
  experimental: {
    // Server action calls: proxy.ts refuses a body over 256 KB (413) before Next reads it; this
    // is Next's own limit behind it (lib/server-actions/check-request.ts, MAX_ACTION_BODY_BYTES).
    serverActions: { bodySizeLimit: '256kb' },
    // Next copies a body for the proxy up to this size and cuts the rest: well above 256 KB, so a
    // body cut here is always one the proxy has already counted past its limit.
    proxyClientMaxBodySize: '1mb',
  },
};

export default nextConfig;
