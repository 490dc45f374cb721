import type { Metadata } from "next";
import { signOutAction } from "@/app/actions";
import { NotificationsToggle } from "@/components/account/notifications-toggle";
import { Button } from "@/components/ui/button";
import { notificationsOf } from "@/lib/account/notifications";
import { hasPermission } from "@/lib/auth/roles";
import { requirePagePermission } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Your account" };

const roleText = {
  member: "You can propose crosses you have fitted, confirm others' and keep job lists.",
  moderator: "You review members' proposals before they reach the catalogue, and can do all a member can.",
  admin: "You import catalogue data, set members' roles and read the audit log, and can do all a moderator can.",
} as const;

export default async function AccountPage() {
  const user = await requirePagePermission("account:use", "/account");
  const notifyByEmail = await notificationsOf(user.id);
  return (
    <div className="max-w-2xl space-y-6">
      <h1 className="text-3xl">Your account</h1>
      <dl className="divide-y divide-rule rounded-lg border border-rule bg-ground-raised">
        <div className="grid gap-1 p-4 sm:grid-cols-[10rem_1fr]">
          <dt className="font-bold">E-mail</dt>
          <dd className="break-all">{user.email}</dd>
        </div>
        <div className="grid gap-1 p-4 sm:grid-cols-[10rem_1fr]">
          <dt className="font-bold">Role</dt>
          <dd>
            <span className="capitalize">{user.role}</span>
            <p className="text-sm text-ink-soft">{roleText[user.role]}</p>
          </dd>
        </div>
        <div className="grid gap-1 p-4 sm:grid-cols-[10rem_1fr]">
          <dt className="font-bold">Notifications</dt>
          <dd>
            <NotificationsToggle initial={notifyByEmail} reviewer={hasPermission(user.role, "proposals:review")} />
          </dd>
        </div>
      </dl>
      <form action={signOutAction}>
        <Button type="submit" variant="secondary">
          Sign out
        </Button>
      </form>
    </div>
  );
}
