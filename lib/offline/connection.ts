/**
 * Whether Understudy can be reached from this browser. The browser's own `navigator.onLine` is not enough: a phone
 * with bars but no data says it is online. So a request that finds no network marks the connection lost (and one
 * that is answered marks it back), a page the service worker served from the device's copy starts out offline, and
 * while it is lost the health address is tried every few seconds to notice when it returns.
 */
const PROBE_MS = 8_000;

let reachable = true;
let probe: ReturnType<typeof setInterval> | undefined;
const listeners = new Set<() => void>();

function set(value: boolean) {
  if (value) stopProbing();
  else startProbing();
  if (reachable === value) return;
  reachable = value;
  for (const listener of listeners) listener();
}

function startProbing() {
  if (probe !== undefined || typeof window === "undefined") return;
  probe = setInterval(() => void tryServer(), PROBE_MS);
}

function stopProbing() {
  clearInterval(probe);
  probe = undefined;
}

async function tryServer() {
  try {
    const response = await fetch("/api/health", { cache: "no-store" });
    if (response.status < 500) set(true);
  } catch {
    // Still no connection: the next try is in a few seconds.
  }
}

/** Called by the one fetcher and the one sender with each answer (true) or failure to reach the server (false). */
export function markConnection(ok: boolean): void {
  set(ok);
}

export function isConnected(): boolean {
  return typeof navigator === "undefined" || (reachable && navigator.onLine);
}

export function subscribeConnection(onChange: () => void): () => void {
  const lost = () => set(false);
  const back = () => void tryServer();
  listeners.add(onChange);
  window.addEventListener("offline", lost);
  window.addEventListener("online", back);
  window.addEventListener("online", onChange);
  return () => {
    listeners.delete(onChange);
    window.removeEventListener("offline", lost);
    window.removeEventListener("online", back);
    window.removeEventListener("online", onChange);
  };
}

// The service worker marks a page it served from the device's copy (app/sw.ts): that page opened with no connection.
if (typeof window !== "undefined") {
  const [page] = performance.getEntriesByType("navigation") as PerformanceNavigationTiming[];
  if (page?.serverTiming?.some((entry) => entry.name === "kept")) set(false);
}
