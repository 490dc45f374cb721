import { isProduction } from "@/lib/env";

/**
 * The session cookie, in a module of its own so that the proxy can use it without loading the database layer: its
 * name, how long a session lasts, and the attributes both lucia and the proxy's sliding expiry set.
 */
export const SESSION_COOKIE = "understudy_session";

export const SESSION_DAYS = 30;

export const SESSION_COOKIE_ATTRIBUTES = { path: "/", sameSite: "lax", httpOnly: true, secure: isProduction } as const;
