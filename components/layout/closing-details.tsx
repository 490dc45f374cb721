"use client";

import { usePathname } from "next/navigation";
import { useEffect, useRef, type ReactNode } from "react";

/**
 * A `<details>` menu that closes itself when the page changes: the header stays mounted across navigation, and a menu
 * left open would cover the page it led to. Without scripts it is an ordinary `<details>`.
 */
export function ClosingDetails({
  className,
  testId,
  children,
}: {
  className?: string;
  testId?: string;
  children: ReactNode;
}) {
  const ref = useRef<HTMLDetailsElement>(null);
  const pathname = usePathname();
  useEffect(() => {
    if (ref.current) ref.current.open = false;
  }, [pathname]);
  return (
    <details ref={ref} className={className} data-testid={testId}>
      {children}
    </details>
  );
}
