"use server";

import { redirect } from "next/navigation";
import { signOut } from "@/lib/auth/accounts";
import { clearSessionCookie, getCurrentSession } from "@/lib/auth/session";

export async function signOutAction(): Promise<void> {
  const { session } = await getCurrentSession();
  if (session) await signOut(session.id);
  await clearSessionCookie();
  redirect("/?signed-out=1");
}
