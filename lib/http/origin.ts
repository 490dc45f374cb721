/**
 * The CSRF rule, in one place for the request proxy and for the one route that bypasses it (the import upload):
 * a mutating request must say it comes from one of our own pages, scheme included.
 */

/** The origin a request claims to come from, from Origin or else Referer. */
export function requestSource(headers: Headers): string | null {
  const origin = headers.get("origin");
  if (origin && origin !== "null") return origin;
  const referer = headers.get("referer");
  if (!referer) return null;
  try {
    return new URL(referer).origin;
  } catch {
    return null;
  }
}

/**
 * Whether the request comes from a page of ours: the origin it was addressed to (scheme and Host header), or the
 * configured APP_URL's. An http page on the same host is another origin, as browsers count it.
 */
export function isOwnOrigin(headers: Headers, requestUrl: URL, appUrl: string | undefined): boolean {
  const source = requestSource(headers);
  if (!source) return false;
  const origins: string[] = [];
  const host = headers.get("host");
  if (host) origins.push(`${requestUrl.protocol}//${host}`);
  try {
    origins.push(new URL(appUrl ?? "").origin);
  } catch {
    // APP_URL unset or malformed: the request's own address alone decides.
  }
  try {
    return origins.includes(new URL(source).origin);
  } catch {
    return false;
  }
}

/** The largest body any route but the import upload takes; anything larger is refused before it is read. */
export const MAX_BODY_BYTES = 64 * 1024;
