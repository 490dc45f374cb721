/**
 * Where to go after signing in: only a path on this site. The candidate is parsed against the app's own origin, as a
 * browser would resolve it, so `/\evil.example/`, `/<tab>/evil.example/`, `//evil.example` and absolute addresses,
 * which browsers read as other hosts, all fall back to the home page.
 */
export function safeReturnPath(next: string | undefined | null, appOrigin: string): string {
  if (!next || !next.startsWith("/")) return "/";
  try {
    const base = new URL(appOrigin);
    const target = new URL(next, base);
    if (target.origin !== base.origin) return "/";
    return `${target.pathname}${target.search}${target.hash}`;
  } catch {
    return "/";
  }
}
