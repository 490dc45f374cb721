/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize resolves its dialect at run time and cannot be bundled.
  serverExternalPackages: ["sequelize"],
  // The test runner builds into its own folder so that it never disturbs a running `npm start`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  experimental: {
    // forbidden() and app/forbidden.tsx for pages a role may not open.
    authInterrupts: true,
    // proxy.ts sees every request, so Next buffers bodies for it; CSV imports may be up to 50 MB (lib/imports/kinds.ts).
    proxyClientMaxBodySize: "52mb",
  },
};

export default nextConfig;
