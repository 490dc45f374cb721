import { env } from "@/lib/env";

/** Set by server.ts from the connection itself; a client's own header of this name is overwritten there. */
export const PEER_HEADER = "x-understudy-peer";

/** `::ffff:127.0.0.1` (an IPv4 address on an IPv6 socket) is 127.0.0.1. */
function plain(address: string): string {
  return address.trim().replace(/^::ffff:(?=\d+\.\d+\.\d+\.\d+$)/, "");
}

/**
 * The address a request came from. The connection's own address (from server.ts) is the truth; X-Forwarded-For is
 * believed only when that connection comes from a proxy named in TRUSTED_PROXIES, and then the rightmost address
 * that is not one of those proxies is the client. Without server.ts (`next dev`), Next fills X-Forwarded-For with the
 * socket's address when no client did, and the rightmost entry is taken, as before.
 */
export function clientAddress(headers: Headers, trustedProxies: readonly string[] = env.TRUSTED_PROXIES): string {
  const forwarded = (headers.get("x-forwarded-for") ?? "").split(",").map(plain).filter(Boolean);
  const peerHeader = headers.get(PEER_HEADER);
  if (peerHeader === null) return (forwarded.at(-1) ?? "unknown").slice(0, 64);
  const peer = plain(peerHeader) || "unknown";
  if (!trustedProxies.includes(peer)) return peer.slice(0, 64);
  const client = [...forwarded].reverse().find((address) => !trustedProxies.includes(address));
  return (client ?? peer).slice(0, 64);
}
