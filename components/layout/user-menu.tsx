import Link from "next/link";
import { ClosingDetails } from "@/components/layout/closing-details";
import { signOutAction } from "@/app/actions";
import type { Role } from "@/lib/auth/roles";

const roleNames: Record<Role, string> = { member: "Member", moderator: "Moderator", admin: "Admin" };

const summaryClass = "flex min-h-11 cursor-pointer list-none items-center gap-2 rounded-md px-2 hover:bg-ground-sunk";

export function UserMenu({ email, role }: { email: string; role: Role }) {
  return (
    <ClosingDetails className="group relative" testId="user-menu">
      <summary className={summaryClass}>
        <span
          className="flex h-8 w-8 items-center justify-center rounded-full bg-ink font-bold text-ground"
          aria-hidden="true"
        >
          {email.charAt(0).toUpperCase()}
        </span>
        <span className="hidden max-w-[14rem] truncate xl:inline">{email}</span>
        <span className="sr-only">Account menu for {email}</span>
        <span aria-hidden="true" className="text-sm transition-transform group-open:rotate-180">
          ▾
        </span>
      </summary>
      <div
        className={
          "absolute right-0 z-20 mt-2 w-64 rounded-lg border border-rule " + "bg-ground-raised p-2 text-ink shadow-lg"
        }
      >
        <p className="px-3 pt-1 pb-2 text-sm text-ink-soft">
          Signed in as <span className="block truncate font-bold text-ink">{email}</span>
          <span className="mt-1 inline-block rounded border border-rule-strong px-1.5 text-xs tracking-wide uppercase">
            {roleNames[role]}
          </span>
        </p>
        <Link
          prefetch={false}
          href="/account"
          className="block rounded-md px-3 py-2 text-ink no-underline hover:bg-ground-sunk"
        >
          Your account
        </Link>
        <Link
          prefetch={false}
          href="/proposals"
          className="block rounded-md px-3 py-2 text-ink no-underline hover:bg-ground-sunk"
        >
          Your proposals
        </Link>
        {role === "admin" && (
          <Link
            prefetch={false}
            href="/audit"
            className="block rounded-md px-3 py-2 text-ink no-underline hover:bg-ground-sunk"
          >
            Audit log
          </Link>
        )}
        <form action={signOutAction}>
          <button type="submit" className="block w-full rounded-md px-3 py-2 text-left hover:bg-ground-sunk">
            Sign out
          </button>
        </form>
      </div>
    </ClosingDetails>
  );
}
