/**
 * Read-your-own-writes with read replicas: a browser that has just changed something carries this cookie for a few
 * seconds (set by proxy.ts on every request that may write), and while it does, its reads go to the primary
 * (db/sequelize.ts), so that a replica a moment behind never shows a person the page from before their own change.
 */
export const WROTE_COOKIE = "understudy_wrote";

/** Longer than a replica on the same network stays behind; short enough that reads soon spread again. */
export const WROTE_SECONDS = 10;

/** Whether the request being served carries the cookie; false outside a request (scripts, jobs). */
export async function justWrote(): Promise<boolean> {
  try {
    const { cookies } = await import("next/headers");
    return (await cookies()).has(WROTE_COOKIE);
  } catch {
    return false;
  }
}

/**
 * The cookie's Set-Cookie value, for a route that writes without passing through the proxy (the import upload);
 * null when there are no replicas to read from.
 */
export function wroteCookieHeader(replicas: number, secure: boolean): string | null {
  if (replicas === 0) return null;
  return `${WROTE_COOKIE}=1; Path=/; Max-Age=${WROTE_SECONDS}; HttpOnly; SameSite=Lax${secure ? "; Secure" : ""}`;
}
