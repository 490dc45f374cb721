/** The cache of pages the service worker keeps (app/sw.ts); emptied on signing out. */
export const PAGES_CACHE = "pages";

/** Pages kept at install, so that they work with no connection even if never opened. */
export const OFFLINE_PAGES = [
  ...["bearing", "seal", "belt", "felt", "packing", "plug", "gasket", "key", "pin", "thread", "chain"].map(
    (name) => `/measure/${name}`,
  ),
  "/kept",
];

/** A page's address (not the API, the framework's files, the service worker or a file with an extension). */
export function isPagePath(pathname: string): boolean {
  if (/^\/(api|_next|serwist)(\/|$)/.test(pathname)) return false;
  return !/\.[a-z0-9]+$/i.test(pathname.split("/").pop() ?? "");
}
