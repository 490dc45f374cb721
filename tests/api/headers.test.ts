import { describe, expect, it } from "vitest";
import { send } from "../helpers/api";

describe("security headers", () => {
  for (const path of ["/", "/measure/seal", "/api/parts/lookup?q=CV-3003", "/sign-in"]) {
    it(`sends them with ${path}`, async () => {
      const response = await send("get", path);
      const csp = String(response.headers["content-security-policy"]);
      expect(csp).toContain("frame-ancestors 'none'");
      expect(csp).toContain("object-src 'none'");
      expect(csp).toContain("default-src 'self'");
      expect(response.headers["x-content-type-options"]).toBe("nosniff");
      expect(response.headers["referrer-policy"]).toBe("strict-origin-when-cross-origin");
      // HSTS belongs to production (over TLS) only; the test server is plain http.
      expect(response.headers["strict-transport-security"]).toBeUndefined();
    });
  }
});
