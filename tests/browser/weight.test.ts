import { gzipSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import { APP_URL } from "../helpers/api";
import { pagePerTest } from "../helpers/browser";

const currentPage = pagePerTest({ width: 390, height: 844 });

// The pages a restorer opens first. Of their first-load JS about 133 kB (gzip) is React's and Next's own runtime,
// the same on every page; the rest is ours, and the forms' checks (zod) load only when a form is opened.
const PAGES = ["/", "/lookup?q=CV-3003", "/parts/1", "/measure/bearing"];
const BUDGET_KB = 160;

describe("first-load JS, at 390 px", () => {
  for (const address of PAGES) {
    it(`${address} loads at most ${BUDGET_KB} kB of scripts (gzip), none of them the forms' checks`, async () => {
      const page = currentPage();
      const scripts: Array<Promise<{ url: string; gzip: number; text: string } | null>> = [];
      page.on("response", (response) => {
        if (response.request().resourceType() !== "script") return;
        scripts.push(
          response
            .body()
            .then((body) => ({ url: response.url(), gzip: gzipSync(body).length, text: body.toString("utf8") }))
            .catch(() => null),
        );
      });
      // Everything the page loads until the network is idle counts, not only the scripts named in its HTML.
      await page.goto(`${APP_URL}${address}`, { waitUntil: "networkidle" });
      const loaded = (await Promise.all(scripts)).filter((s) => s !== null);
      const total = loaded.reduce((sum, s) => sum + s.gzip, 0) / 1024;
      expect(loaded.length).toBeGreaterThan(0);
      expect(total).toBeLessThanOrEqual(BUDGET_KB);
      expect(loaded.filter((s) => s.text.includes("ZodError")).map((s) => s.url)).toEqual([]);
    });
  }
});
