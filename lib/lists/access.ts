import { getCurrentSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { queryOf } from "@/lib/http/query";
import { parseWith } from "@/lib/validation/parse";
import { tokenQuery } from "@/lib/validation/lists";

/** The owner by session, or anyone holding the list's share token (`?token=`), who may only read it. */
export async function listAccess(request: Request): Promise<{ userId: string } | { token: string }> {
  const { token } = parseWith(tokenQuery, queryOf(request));
  if (token) return { token };
  const { user } = await getCurrentSession();
  if (!user) throw new AppError("unauthenticated", "Sign in to see your job lists.");
  return { userId: user.id };
}
