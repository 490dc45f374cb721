import { gzipSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import { APP_URL } from "../helpers/api";
import { pagePerTest } from "../helpers/browser";

const currentPage = pagePerTest({ width: 390, height: 844 });

const PAGES = ["/", "/lookup?q=CV-3003", "/parts/1", "/measure/bearing"];

describe("first-load JS", () => {
  for (const address of PAGES) {
    it(`weighs ${address}`, async () => {
      const page = currentPage();
      const scripts = new Map<string, number>();
      page.on("response", async (response) => {
        if (response.request().resourceType() !== "script") return;
        const body = await response.body().catch(() => null);
        if (body) scripts.set(response.url(), gzipSync(body).length);
      });
      await page.goto(`${APP_URL}${address}`, { waitUntil: "networkidle" });
      const total = [...scripts.values()].reduce((a, b) => a + b, 0);
      console.log(address, (total / 1024).toFixed(1), [...scripts].map(([u, n]) => `${u.split("/").pop()} ${(n / 1024).toFixed(1)}`).join(", "));
      expect(total).toBeGreaterThan(0);
    });
  }
});
