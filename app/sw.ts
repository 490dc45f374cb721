/// <reference lib="webworker" />
import {
  ExpirationPlugin,
  NetworkFirst,
  NetworkOnly,
  Serwist,
  type PrecacheEntry,
  type SerwistGlobalConfig,
} from "serwist";
import { OFFLINE_PAGES, PAGES_CACHE, isPagePath } from "@/lib/offline/pages";

// The service worker (built by app/serwist/[path]/route.ts): the app's scripts, styles and fonts are kept at install;
// pages are fetched from the network first and kept, so the calculators and what a person opened load with no
// connection; the API is never kept here (the pages keep their own copies in IndexedDB, lib/offline/store.ts).

declare global {
  interface WorkerGlobalScope extends SerwistGlobalConfig {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}
declare const self: ServiceWorkerGlobalScope;

/** Only a whole, direct answer is kept: never an error, and never a redirect (to sign-in, say). */
const keepOnlyPlainPages = {
  cacheWillUpdate: async ({ response }: { response: Response }) =>
    response.status === 200 && !response.redirected ? response : null,
};

/** A page served from the device's copy says so, for the page to know it opened with no connection. */
const markKept = {
  cachedResponseWillBeUsed: async ({ cachedResponse }: { cachedResponse?: Response }) => {
    if (!cachedResponse) return null;
    const headers = new Headers(cachedResponse.headers);
    headers.append("Server-Timing", 'kept;desc="kept on this device"');
    return new Response(cachedResponse.body, { status: cachedResponse.status, headers });
  },
};

/**
 * A calculator's page is one page whatever sizes its address carries (the page reads them itself), so a calculator
 * reloaded or shared with its sizes opens from the device's copy too. Not the gasket pages: they draw the template of
 * their address on the server.
 */
const oneCopyPerCalculator = {
  cacheKeyWillBeUsed: async ({ request }: { request: Request }) => {
    const url = new URL(request.url);
    const drawsItsAddress = url.pathname.startsWith("/measure/gasket");
    if (!url.pathname.startsWith("/measure") || drawsItsAddress || url.search === "") return request;
    return `${url.origin}${url.pathname}`;
  },
};

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  skipWaiting: true,
  clientsClaim: true,
  navigationPreload: false,
  runtimeCaching: [
    {
      matcher: ({ request, url, sameOrigin }) =>
        sameOrigin && request.method === "GET" && request.headers.get("RSC") !== "1" && isPagePath(url.pathname),
      handler: new NetworkFirst({
        cacheName: PAGES_CACHE,
        networkTimeoutSeconds: 8,
        plugins: [
          keepOnlyPlainPages,
          markKept,
          oneCopyPerCalculator,
          new ExpirationPlugin({ maxEntries: 150, maxAgeSeconds: 60 * 24 * 60 * 60 }),
        ],
      }),
    },
    { matcher: ({ sameOrigin }) => sameOrigin, handler: new NetworkOnly() },
  ],
  fallbacks: { entries: [{ url: "/offline.html", matcher: ({ request }) => request.mode === "navigate" }] },
});

// The calculators and the page of what is kept on this device are fetched at install, so that they load with no
// connection even if they were never opened.
self.addEventListener("install", (event) => {
  event.waitUntil(
    caches.open(PAGES_CACHE).then((cache) =>
      Promise.all(
        OFFLINE_PAGES.map(async (path) => {
          if (await cache.match(path)) return;
          try {
            const response = await fetch(path, { credentials: "same-origin" });
            if (response.status === 200 && !response.redirected) await cache.put(path, response);
          } catch {
            // Fetched again when the page is opened with a connection.
          }
        }),
      ),
    ),
  );
});

serwist.addEventListeners();
