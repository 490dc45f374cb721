import { forbidden, redirect } from "next/navigation";
import { cookies } from "next/headers";
import { cache } from "react";
import type { Session, User } from "lucia";
import { lucia } from "@/lib/auth/lucia";
import { hasPermission, type Permission } from "@/lib/auth/roles";
import { accountUsable } from "@/lib/auth/demo-accounts";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";

export type CurrentUser = User;
export type CurrentSession = { user: User; session: Session } | { user: null; session: null };

/** The signed-in user for this request, read once per request however many components ask. */
export const getCurrentSession = cache(async (): Promise<CurrentSession> => {
  const store = await cookies();
  const sessionId = store.get(lucia.sessionCookieName)?.value ?? null;
  if (!sessionId) return { user: null, session: null };
  const validated = await lucia.validateSession(sessionId);
  // A session a demo account opened before the app went into production no longer counts.
  const result: CurrentSession =
    validated.user && !accountUsable(validated.user.email, env.APP_ENV) ? { user: null, session: null } : validated;
  try {
    if (result.session?.fresh) {
      const cookie = lucia.createSessionCookie(result.session.id);
      store.set(cookie.name, cookie.value, cookie.attributes);
    }
    if (!result.session) {
      const cookie = lucia.createBlankSessionCookie();
      store.set(cookie.name, cookie.value, cookie.attributes);
    }
  } catch {
    // Server components may not set cookies; the proxy refreshes the cookie on the next navigation instead.
  }
  return result;
});

/** For route handlers and server actions: the user, or a 401. */
export async function requireUser(): Promise<User> {
  const { user } = await getCurrentSession();
  if (!user) throw new AppError("unauthenticated", "Sign in to do this.");
  return user;
}

/** For route handlers and server actions: the user holding the permission, or a 401/403. */
export async function requirePermission(permission: Permission): Promise<User> {
  const user = await requireUser();
  if (!hasPermission(user.role, permission)) {
    throw new AppError("forbidden", "Your account's role does not allow this.");
  }
  return user;
}

/** For pages: sends a visitor to sign in (and back here afterwards), and shows the 403 page to the wrong role. */
export async function requirePagePermission(permission: Permission, returnTo: string): Promise<User> {
  const { user } = await getCurrentSession();
  if (!user) redirect(`/sign-in?next=${encodeURIComponent(returnTo)}`);
  if (!hasPermission(user.role, permission)) forbidden();
  return user;
}

export async function setSessionCookie(sessionId: string): Promise<void> {
  const cookie = lucia.createSessionCookie(sessionId);
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}

export async function clearSessionCookie(): Promise<void> {
  const cookie = lucia.createBlankSessionCookie();
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}
