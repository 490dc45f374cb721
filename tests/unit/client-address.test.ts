import { describe, expect, it } from "vitest";
import { clientAddress } from "@/lib/http/client-address";

describe("client address", () => {
  it("takes the address the nearest proxy saw, not one the client wrote in front", () => {
    expect(clientAddress(new Headers({ "x-forwarded-for": "10.9.9.9, 203.0.113.7" }))).toBe("203.0.113.7");
  });

  it("says unknown when there is no forwarded address", () => {
    expect(clientAddress(new Headers())).toBe("unknown");
  });
});

describe("client address behind server.ts", () => {
  const headers = (peer: string, forwarded?: string) =>
    new Headers({ "x-understudy-peer": peer, ...(forwarded ? { "x-forwarded-for": forwarded } : {}) });

  it("takes the connection's own address and ignores X-Forwarded-For from anyone not trusted", () => {
    expect(clientAddress(headers("203.0.113.9", "198.51.100.1"), [])).toBe("203.0.113.9");
    expect(clientAddress(headers("::ffff:203.0.113.9", "198.51.100.1"), ["10.0.0.2"])).toBe("203.0.113.9");
  });

  it("believes X-Forwarded-For from a trusted proxy, taking the rightmost address that is not a proxy", () => {
    expect(clientAddress(headers("10.0.0.2", "198.51.100.1, 203.0.113.7"), ["10.0.0.2"])).toBe("203.0.113.7");
    expect(clientAddress(headers("10.0.0.2", "203.0.113.7, 10.0.0.3"), ["10.0.0.2", "10.0.0.3"])).toBe("203.0.113.7");
    expect(clientAddress(headers("10.0.0.2"), ["10.0.0.2"])).toBe("10.0.0.2");
  });
});
