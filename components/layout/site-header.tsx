import Link from "next/link";
import { AREAS } from "@/components/layout/areas";
import { LogoMark } from "@/components/layout/logo-mark";
import { UserMenu } from "@/components/layout/user-menu";
import { getCurrentSession } from "@/lib/auth/session";
import { hasPermission } from "@/lib/auth/roles";

export async function SiteHeader() {
  const { user } = await getCurrentSession();
  // Visitors see what members can do; staff areas appear only to the roles that hold them.
  const role = user?.role ?? "member";
  const areas = AREAS.filter((area) => !area.permission || hasPermission(role, area.permission));

  return (
    <header className="no-print border-b border-ink/80 bg-ink text-ground">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
        <Link href="/" className="flex items-center gap-2 text-ground no-underline">
          <LogoMark className="h-8 w-8 text-brass-light" />
          <span className="text-xl font-bold tracking-wide">Understudy</span>
        </Link>
        <div className="ml-auto flex items-center gap-3">
          {user ? (
            <UserMenu email={user.email} role={user.role} />
          ) : (
            <>
              <Link href="/sign-in" className="rounded-md px-3 py-2 text-ground no-underline hover:bg-white/10">
                Sign in
              </Link>
              <Link
                href="/sign-up"
                className="rounded-md bg-brass-light px-3 py-2 font-bold text-ink no-underline hover:bg-brass-wash"
              >
                Join
              </Link>
            </>
          )}
        </div>
        <nav aria-label="Areas" className="-mx-1 flex w-full flex-wrap gap-x-1 pb-1 text-[0.95rem]">
          {areas.map((area) =>
            area.ready ? (
              <Link
                key={area.href}
                href={area.href}
                className="rounded-md px-3 py-2 whitespace-nowrap text-ground no-underline hover:bg-white/10"
              >
                {area.label}
              </Link>
            ) : (
              <span
                key={area.href}
                className="rounded-md px-3 py-2 whitespace-nowrap text-ground/55"
                title="This area opens in a coming release"
              >
                {area.label}{" "}
                <span className="ml-1 rounded border border-ground/30 px-1 text-[0.7rem] uppercase">soon</span>
              </span>
            ),
          )}
        </nav>
      </div>
    </header>
  );
}
