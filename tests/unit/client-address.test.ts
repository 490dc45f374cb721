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
