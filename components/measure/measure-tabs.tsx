"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

const TABS = [
  { href: "/measure/bearing", label: "Ball bearing" },
  { href: "/measure/seal", label: "Lip seal" },
  { href: "/measure/belt", label: "V-belt" },
  { href: "/measure/felt", label: "Felt" },
  { href: "/measure/packing", label: "Packing" },
  { href: "/measure/plug", label: "Plug" },
  { href: "/measure/gasket", label: "Gasket" },
  { href: "/measure/key", label: "Key" },
  { href: "/measure/pin", label: "Pin" },
  { href: "/measure/thread", label: "Thread" },
  { href: "/measure/chain", label: "Chain" },
];

const TAB = "flex min-h-11 items-center rounded-md border-2 px-3 text-base font-bold no-underline sm:px-4 sm:text-lg";

export function MeasureTabs() {
  const pathname = usePathname();
  return (
    <nav aria-label="Kind of part" className="flex flex-wrap gap-1.5 sm:gap-2">
      {TABS.map((tab) => {
        const current = pathname === tab.href;
        return (
          <Link
            key={tab.href}
            href={tab.href}
            aria-current={current ? "page" : undefined}
            className={`${TAB} ${
              current ? "border-ink bg-ink text-ground" : "border-ink/70 bg-ground-raised text-ink hover:bg-ground-sunk"
            }`}
          >
            {tab.label}
          </Link>
        );
      })}
    </nav>
  );
}
