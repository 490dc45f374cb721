"use client";

import { SerwistProvider } from "@serwist/turbopack/react";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { useEffect, useRef } from "react";
import { useOnline } from "@/lib/hooks/use-online";
import { clearDevice } from "@/lib/offline/store";
import { PAGES_CACHE } from "@/lib/offline/pages";

/**
 * The installable app's service worker (not in development, where pages change under it), the banner that says
 * what still works with no connection, and the forgetting of what was kept on this device when a person signs out.
 */
export function OfflineSupport() {
  const online = useOnline();
  const pathname = usePathname();
  const first = useRef(true);
  // A page reached inside the app (not loaded whole) is fetched by the service worker too, so it is kept as well.
  useEffect(() => {
    if (first.current) {
      first.current = false;
      return;
    }
    if (online)
      navigator.serviceWorker?.controller?.postMessage({ type: "CACHE_URLS", payload: { urlsToCache: [pathname] } });
  }, [pathname, online]);
  useEffect(() => {
    if (new URLSearchParams(window.location.search).get("signed-out") !== "1") return;
    void clearDevice();
    if ("caches" in window) void caches.delete(PAGES_CACHE);
  }, []);
  return (
    <>
      <SerwistProvider
        swUrl="/serwist/sw.js"
        disable={process.env.NODE_ENV === "development"}
        reloadOnOnline={false}
        cacheOnNavigation={false}
      />
      {!online && (
        <div role="status" className="no-print border-b border-rule-strong bg-brass-wash" data-testid="offline-banner">
          <p className="mx-auto max-w-5xl px-4 py-2 text-sm sm:px-6">
            <span className="font-bold">Offline.</span> The calculators still work on this device; parts and job lists
            you opened show the copy{" "}
            <Link prefetch={false} href="/kept">
              kept on this device
            </Link>
            , and list changes are sent when the connection returns. Look-up and proposals need a connection.
          </p>
        </div>
      )}
    </>
  );
}
