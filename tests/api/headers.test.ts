import { describe, expect, it } from "vitest";
import request from "supertest";
import { APP_URL, send } from "../helpers/api";

describe("security headers", () => {
  for (const path of ["/", "/measure/seal", "/api/parts/lookup?q=CV-3003", "/sign-in"]) {
    it(`sends them with ${path}`, async () => {
      const response = await send("get", path);
      const csp = String(response.headers["content-security-policy"]);
      expect(csp).toContain("frame-ancestors 'none'");
      expect(csp).toContain("object-src 'none'");
      expect(csp).toContain("default-src 'self'");
      expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/);
      expect(csp).not.toContain("'unsafe-inline' 'strict-dynamic'");
      expect(response.headers["x-content-type-options"]).toBe("nosniff");
      expect(response.headers["referrer-policy"]).toBe("strict-origin-when-cross-origin");
      // HSTS belongs to production (over TLS) only; the test server is plain http.
      expect(response.headers["strict-transport-security"]).toBeUndefined();
    });
  }
});

describe("the page's script nonce", () => {
  it("is new for every request and on every script Next puts in the page", async () => {
    const [a, b] = await Promise.all([send("get", "/measure/seal"), send("get", "/measure/seal")]);
    const nonceOf = (csp: string) => /'nonce-([^']+)'/.exec(csp)?.[1];
    const first = nonceOf(String(a.headers["content-security-policy"]));
    expect(first).toBeTruthy();
    expect(first).not.toBe(nonceOf(String(b.headers["content-security-policy"])));
    const scripts = [...a.text.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag).toContain(`nonce="${first}"`);
  });
});

describe("the web app manifest", () => {
  it("names the product with its own icon and colours", async () => {
    const manifest = await request(APP_URL).get("/manifest.webmanifest");
    expect(manifest.status).toBe(200);
    expect(JSON.parse(manifest.text)).toMatchObject({
      short_name: "Understudy",
      start_url: "/",
      display: "standalone",
      icons: [expect.objectContaining({ src: "/icon.svg", type: "image/svg+xml" })],
    });
    const icon = await request(APP_URL).get("/icon.svg");
    expect(icon.status).toBe(200);
    expect(icon.headers["content-type"]).toContain("image/svg+xml");
  });
});

describe("the service worker", () => {
  it("is served as a script for the whole site, with the build's files and the offline page to keep", async () => {
    const worker = await request(APP_URL).get("/serwist/sw.js").buffer(true);
    expect(worker.status).toBe(200);
    expect(worker.headers["content-type"]).toMatch(/javascript/);
    expect(worker.headers["service-worker-allowed"]).toBe("/");
    expect(worker.text).toContain("/offline.html");
    expect(worker.text).toMatch(/\/_next\/static\/chunks\/[^"]+\.js/);
    expect(worker.text).toMatch(/"\/measure"/);
    // Pages may register it: their policy names the site as the one place a worker may come from.
    const page = await send("get", "/");
    expect(String(page.headers["content-security-policy"])).toContain("worker-src 'self'");
  });

  it("has an offline page that says what still works", async () => {
    const page = await request(APP_URL).get("/offline.html");
    expect(page.status).toBe(200);
    expect(page.text).toContain("You are offline");
    expect(page.text).toContain('href="/kept"');
    expect(page.text).toContain('href="/measure/bearing"');
  });
});
