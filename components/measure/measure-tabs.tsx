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

export function MeasureTabs() {
  const pathname = usePathname();
  return (
    <nav aria-label="Kind of part" className="flex flex-wrap gap-2">
      {TABS.map((tab) => {
        const current = pathname === tab.href;
        return (
          <Link
            key={tab.href}
            href={tab.href}
            aria-current={current ? "page" : undefined}
            className={`min-h-12 rounded-md border-2 px-4 py-2 text-lg font-bold no-underline ${
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
