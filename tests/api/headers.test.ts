import { describe, expect, it } from "vitest";
import request from "supertest";
import { APP_URL, send } from "../helpers/api";

describe("security headers", () => {
  for (const path of ["/", "/measure/seal", "/api/lists", "/sign-in"]) {
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

describe("the read-only answers of the catalogue and the calculators", () => {
  // The request proxy does not run for them (proxy.ts's matcher), and next.config.mjs gives them a policy that
  // allows nothing: both lists must name the same addresses.
  const READ_ONLY = [
    "/api/parts/lookup?q=CV-3003",
    "/api/standard-parts?q=6205",
    "/api/bearings/decode?designation=6205",
    "/api/bearings/match?bore=25&od=52",
    "/api/seals/match?shaft=35&bore=52",
    "/api/seals/press-fit?bore=52&sealOd=52.1",
    "/api/belts/decode?designation=B60",
    "/api/belts/identify?top=17",
    "/api/belts/drive?large=10&small=5&center=24",
    "/api/felts/size?shaft=30&bore=40&width=5",
    "/api/packing/size?shaft=20&bore=32",
    "/api/plugs/match?bore=40",
    "/api/keys/woodruff?number=606",
    "/api/keys/woodruff/match?width=0.185&diameter=0.74&unit=in",
    "/api/keys/parallel?shaft=25",
    "/api/pins/taper?number=4",
    "/api/pins/taper/match?largeEnd=8.79",
    "/api/threads/identify?diameter=9.8&pitch=1.25",
    "/api/threads/grease-fittings",
    "/api/chain/decode?number=40",
    "/api/chain/identify?pitch=12.7&roller=7.9",
    "/api/chain/links?number=40&teeth1=15&teeth2=30&center=20&unit=in",
  ];
  for (const path of READ_ONLY) {
    it(`answers ${path.split("?")[0]} without the proxy, with a policy that allows nothing`, async () => {
      const response = await send("get", path);
      expect(response.status).toBe(200);
      expect(response.headers["content-security-policy"]).toBe("default-src 'none'; frame-ancestors 'none'");
      expect(response.headers["x-content-type-options"]).toBe("nosniff");
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
