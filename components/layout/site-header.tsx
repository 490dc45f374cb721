import Link from "next/link";
import { AREAS, type Area } from "@/components/layout/areas";
import { ClosingDetails } from "@/components/layout/closing-details";
import { LogoMark } from "@/components/layout/logo-mark";
import { UserMenu } from "@/components/layout/user-menu";
import { getCurrentSession } from "@/lib/auth/session";
import { hasPermission } from "@/lib/auth/roles";

const linkClass =
  "flex min-h-11 items-center rounded-md px-3 whitespace-nowrap text-ink no-underline hover:bg-ground-sunk";
const joinClass = [
  "flex min-h-11 items-center rounded-md bg-ink px-4",
  "font-bold text-ground no-underline hover:bg-ink-soft",
].join(" ");
const menuClass =
  "flex min-h-11 min-w-11 cursor-pointer list-none items-center justify-center gap-1 rounded-md border-2 " +
  "border-ink/70 px-3 font-bold";
const panelClass = "absolute inset-x-0 top-full z-30 border-b border-rule-strong bg-ground-raised px-3 py-2 shadow-lg";

function AreaLink({ area }: { area: Area }) {
  return area.ready ? (
    <Link prefetch={false} href={area.href} className={linkClass}>
      {area.label}
    </Link>
  ) : (
    <span
      className="flex min-h-11 items-center px-3 whitespace-nowrap text-ink-faint"
      title="Coming in a later release"
    >
      {area.label} <span className="ml-1 rounded border border-rule px-1 text-[0.7rem] uppercase">soon</span>
    </span>
  );
}

/**
 * Every page behind the header's links is rendered for each request, so they are not prefetched: a page would
 * otherwise ask the server for a dozen pages nobody opened.
 *
 * The header: on paper, in graphite, one compact row. On a phone it holds the name, a search button and a menu button
 * that opens the areas (and sign-in); from a tablet up the areas sit in the row itself.
 */
export async function SiteHeader() {
  const { user } = await getCurrentSession();
  // Visitors see what members can do; staff areas appear only to the roles that hold them.
  const role = user?.role ?? "member";
  const areas = AREAS.filter((area) => !area.permission || hasPermission(role, area.permission));
  const signIn = !user && (
    <>
      <Link prefetch={false} href="/sign-in" className={linkClass}>
        Sign in
      </Link>
      <Link prefetch={false} href="/sign-up" className={joinClass}>
        Join
      </Link>
    </>
  );

  return (
    <header className="no-print relative border-b border-rule-strong bg-ground" data-testid="site-header">
      <div className="mx-auto flex max-w-5xl items-center gap-2 px-3 py-1.5 sm:px-6 lg:gap-4">
        <Link prefetch={false} href="/" className="flex min-h-11 items-center gap-2 text-ink no-underline">
          <LogoMark className="h-8 w-8 text-brass" />
          <span className="text-xl font-bold tracking-wide">Understudy</span>
        </Link>
        <nav aria-label="Areas" className="hidden flex-wrap text-[0.95rem] lg:flex">
          {areas.map((area) => (
            <AreaLink key={area.href} area={area} />
          ))}
        </nav>
        <div className="ml-auto flex items-center gap-1">
          <Link
            prefetch={false}
            href="/lookup"
            className={`${linkClass} lg:hidden`}
            aria-label="Look up a factory number"
          >
            <svg
              viewBox="0 0 24 24"
              className="h-6 w-6"
              aria-hidden="true"
              fill="none"
              stroke="currentColor"
              strokeWidth={2}
            >
              <circle cx="10.5" cy="10.5" r="6.5" />
              <path d="M15.5 15.5 21 21" strokeLinecap="round" />
            </svg>
          </Link>
          {user ? (
            <UserMenu email={user.email} role={user.role} />
          ) : (
            <div className="hidden items-center gap-1 sm:flex">{signIn}</div>
          )}
          <ClosingDetails className="group lg:hidden" testId="area-menu">
            <summary className={menuClass} aria-label="Menu: the areas of Understudy">
              <svg
                viewBox="0 0 24 24"
                className="h-5 w-5"
                aria-hidden="true"
                fill="none"
                stroke="currentColor"
                strokeWidth={2.4}
              >
                <path d="M4 7h16M4 12h16M4 17h16" strokeLinecap="round" />
              </svg>
              <span className="hidden sm:inline">Menu</span>
            </summary>
            <nav aria-label="Areas" className={panelClass}>
              <div className="mx-auto grid max-w-5xl gap-1 sm:grid-cols-2">
                {areas.map((area) => (
                  <AreaLink key={area.href} area={area} />
                ))}
                {!user && <div className="flex items-center gap-2 pt-1 sm:hidden">{signIn}</div>}
              </div>
            </nav>
          </ClosingDetails>
        </div>
      </div>
    </header>
  );
}
