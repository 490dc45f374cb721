/**
 * The address a request came from. Next fills in x-forwarded-for with the socket address when no proxy set it;
 * behind a reverse proxy the rightmost entry is the one that proxy saw.
 */
export function clientAddress(headers: Headers): string {
  const forwarded = headers.get("x-forwarded-for");
  const last = forwarded?.split(",").map((part) => part.trim()).filter(Boolean).at(-1);
  return (last ?? "unknown").slice(0, 64);
}
