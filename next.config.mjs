// Security headers for every response. The script policy allows inline scripts ('unsafe-inline'), as Next.js
// documents for a CSP without nonces: a nonce would make every page render per request, and the catalogue's pages
// are served static and cached. Everything else is shut: no framing, no plugins, no foreign scripts, forms post only
// here, and the browser talks only to this site and the photo store (presigned uploads go straight to it).
function securityHeaders() {
  const production = process.env.APP_ENV === "production";
  const development = process.env.NODE_ENV === "development";
  let photoStore = "";
  try {
    photoStore = new URL(process.env.S3_ENDPOINT ?? "http://127.0.0.1:9090").origin;
  } catch {
    photoStore = "";
  }
  const csp = [
    "default-src 'self'",
    `script-src 'self' 'unsafe-inline'${development ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    `connect-src 'self' ${photoStore}`.trim(),
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
  return [
    { key: "Content-Security-Policy", value: csp },
    { key: "X-Content-Type-Options", value: "nosniff" },
    { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
    { key: "X-Frame-Options", value: "DENY" },
    { key: "Permissions-Policy", value: "camera=(self), geolocation=(), microphone=()" },
    ...(production ? [{ key: "Strict-Transport-Security", value: "max-age=31536000; includeSubDomains" }] : []),
  ];
}

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize resolves its dialect at run time and cannot be bundled.
  serverExternalPackages: ["sequelize"],
  // The test runner builds into its own folder so that it never disturbs a running `npm start`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  async headers() {
    return [{ source: "/:path*", headers: securityHeaders() }];
  },
  experimental: {
    // forbidden() and app/forbidden.tsx for pages a role may not open.
    authInterrupts: true,
    // proxy.ts sees every request but the import upload, and Next buffers bodies for it: no route behind the proxy
    // takes more than 64 KB (lib/http/origin.ts), so nothing larger is ever buffered.
    proxyClientMaxBodySize: "64kb",
  },
};

export default nextConfig;
