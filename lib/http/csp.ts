/**
 * The Content-Security-Policy of every page, with a fresh nonce for each request (set by proxy.ts, which Next reads
 * to put the nonce on its own scripts). Scripts run only with the nonce, or when a nonced script loaded them
 * ('strict-dynamic'); no framing, no plugins, forms post only here, and the browser talks only to this site and the
 * photo store (presigned uploads go straight to it). Inline style attributes stay allowed: React sets a few.
 */
export function contentSecurityPolicy(nonce: string, options: { development: boolean; photoStore: string }): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${options.development ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "worker-src 'self'",
    "manifest-src 'self'",
    `connect-src 'self' ${options.photoStore}`.trim(),
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** The photo store's origin, for connect-src; nothing when it is not set or not a URL. */
export function photoStoreOrigin(endpoint: string | undefined): string {
  try {
    return endpoint ? new URL(endpoint).origin : "";
  } catch {
    return "";
  }
}
