import { SESSION_COOKIE_ATTRIBUTES } from "@/lib/auth/cookie";

/**
 * Read-your-own-writes with read replicas: a browser that has just changed something carries this cookie for a few
 * seconds (set by proxy.ts on every request that may write), and while it does, its reads go to the primary
 * (db/sequelize.ts), so that a replica a moment behind never shows a person the page from before their own change.
 */
export const WROTE_COOKIE = "understudy_wrote";

/** Longer than a replica on the same network stays behind; short enough that reads soon spread again. */
export const WROTE_SECONDS = 10;

/** Set the same way by the proxy and by the import upload, which bypasses it. */
export const WROTE_COOKIE_ATTRIBUTES = { ...SESSION_COOKIE_ATTRIBUTES, maxAge: WROTE_SECONDS };

/** Whether the request being served carries the cookie; false outside a request (scripts, jobs). */
export async function justWrote(): Promise<boolean> {
  try {
    const { cookies } = await import("next/headers");
    return (await cookies()).has(WROTE_COOKIE);
  } catch {
    return false;
  }
}
