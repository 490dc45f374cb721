// Security headers for every response. The pages' Content-Security-Policy, with a nonce for each request, is set by
// proxy.ts (lib/http/csp.ts); the one route that bypasses the proxy, the import upload, answers JSON only and gets a
// policy that allows nothing.
function securityHeaders() {
  const production = process.env.APP_ENV === "production";
  return [
    { key: "X-Content-Type-Options", value: "nosniff" },
    { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
    { key: "X-Frame-Options", value: "DENY" },
    { key: "Permissions-Policy", value: "camera=(self), geolocation=(), microphone=()" },
    ...(production ? [{ key: "Strict-Transport-Security", value: "max-age=31536000; includeSubDomains" }] : []),
  ];
}

// The anonymous, read-only answers of the catalogue and the calculators, which the request proxy leaves alone
// (proxy.ts lists them in its matcher): JSON for anyone, with a policy that allows nothing, like the import upload's.
const READ_ONLY_ANSWERS = [
  "parts/lookup",
  "standard-parts",
  "bearings/decode",
  "bearings/match",
  "seals/match",
  "seals/press-fit",
  "belts/decode",
  "belts/identify",
  "belts/drive",
  "felts/size",
  "packing/size",
  "plugs/match",
  "keys/woodruff",
  "keys/woodruff/match",
  "keys/parallel",
  "pins/taper",
  "pins/taper/match",
  "threads/identify",
  "threads/grease-fittings",
  "chain/decode",
  "chain/identify",
  "chain/links",
];
const NOTHING_ALLOWED = [{ key: "Content-Security-Policy", value: "default-src 'none'; frame-ancestors 'none'" }];

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize resolves its dialect at run time and cannot be bundled; esbuild bundles the service worker at build
  // time (app/serwist/[path]/route.ts), as @serwist/turbopack's withSerwist would add.
  serverExternalPackages: ["sequelize", "esbuild"],
  // `npm test` and the benchmarks build into .next-test (stack.ts sets NEXT_DIST_DIR), so that they never replace the
  // build a running `npm start` or `npm run dev` serves.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  async headers() {
    return [
      { source: "/:path*", headers: securityHeaders() },
      { source: "/api/imports", headers: NOTHING_ALLOWED },
      ...READ_ONLY_ANSWERS.map((answer) => ({ source: `/api/${answer}`, headers: NOTHING_ALLOWED })),
    ];
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
