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
    // proxy.ts sees every request but the import upload, and Next buffers bodies for it: no route behind the proxy
    // takes more than 64 KB (lib/http/origin.ts), so nothing larger is ever buffered.
    proxyClientMaxBodySize: "64kb",
  },
};

export default nextConfig;
