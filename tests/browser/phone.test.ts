import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { APP_URL } from "../helpers/api";
import { pagePerTest, signInAs } from "../helpers/browser";

const currentPage = pagePerTest({ width: 390, height: 844 });

/** The page fits the screen: nothing wider than the viewport, so nothing to scroll sideways. */
async function overflow(page: Page) {
  return page.evaluate(() => {
    const width = document.documentElement.clientWidth;
    const wide = [...document.querySelectorAll("body *")].filter((e) => {
      const r = e.getBoundingClientRect();
      return r.width > 0 && r.right > width + 1 && !e.closest("details:not([open])");
    });
    return {
      scroll: document.documentElement.scrollWidth - width,
      wide: wide.slice(0, 3).map((e) => e.outerHTML.slice(0, 80)),
    };
  });
}

// The page and the control a person came for: it must be on the first screen, without scrolling.
const PAGES: Array<[string, string]> = [
  ["/", "input[type=search]"],
  ["/lookup?q=CV-3003", "input[type=search]"],
  ["/measure/bearing", "main input"],
  ["/measure/seal", "main input"],
  ["/measure/felt", "main input"],
  ["/measure/gasket", "main input, main select"],
  ["/measure/gasket/print?unit=mm&outline=circle&od=120&holes=4&pcd=100&hole=10&paper=a4", "main button"],
  ["/measure/thread", "main input"],
  ["/measure/chain", "main input"],
  ["/machines", "main a"],
  ["/machines/1", "main h1"],
  ["/lists", "main h1"],
  ["/review", "main h1"],
  ["/admin/imports", "main h1"],
  ["/audit", "main h1"],
  ["/kept", "main h1"],
];

describe("on a phone and a tablet", () => {
  it("fits every page to 360, 390 and 768 px, with a compact header and the main control above the fold", async () => {
    const page = currentPage();
    await signInAs(page, "admin@understudy.test");
    for (const width of [360, 390, 768]) {
      await page.setViewportSize({ width, height: 844 });
      for (const [path, control] of PAGES) {
        await page.goto(`${APP_URL}${path}`);
        await page.locator(control).first().waitFor();
        const result = await overflow(page);
        expect(result, `${path} at ${width} px`).toEqual({ scroll: 0, wide: [] });
        const header = await page.getByTestId("site-header").boundingBox();
        if (width < 768) expect(header!.height, `${path} header at ${width} px`).toBeLessThanOrEqual(64);
        const box = await page.locator(control).first().boundingBox();
        expect(box!.y + Math.min(box!.height, 48), `${path} ${control} at ${width} px`).toBeLessThanOrEqual(844);
      }
    }
  });

  it("opens the areas from the menu button, and closes it on the page it leads to", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/`);
    const menu = page.getByTestId("area-menu");
    await page.getByLabel("Menu: the areas of Understudy").click();
    await menu.getByRole("link", { name: "Machines" }).click();
    await page.waitForURL(/\/machines$/);
    await expect.poll(() => menu.evaluate((d) => (d as HTMLDetailsElement).open)).toBe(false);
    // Touch targets: the menu button and the search button are at least 44 px.
    for (const label of ["Menu: the areas of Understudy", "Look up a factory number"]) {
      const box = await page.getByLabel(label).boundingBox();
      expect(Math.min(box!.width, box!.height), label).toBeGreaterThanOrEqual(44);
    }
  });

  it("opens the look-up suggestions within a phone's screen", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/`);
    await page.locator("input[type=search]").fill("CV-300");
    const list = page.getByRole("listbox", { name: "Matching factory numbers" });
    await list.waitFor();
    await expect.poll(async () => (await list.boundingBox())!.y).toBeLessThan(844 / 2);
    const first = await list.getByRole("option").first().boundingBox();
    expect(first!.y + first!.height).toBeLessThanOrEqual(844);
  });

  it("keeps a calculator's sizes over a reload, and shares them as a link", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/measure/seal`);
    await page.getByText("inch", { exact: true }).click();
    await page.getByLabel("Shaft", { exact: true }).fill("1.497");
    await page.getByLabel("Housing bore", { exact: true }).fill("2.374");
    await page.getByTestId("order-label").getByText("1-1/2 × 2.374").waitFor();
    await expect.poll(() => page.url()).toContain("shaft=1.497");
    const link = page.url();
    await page.reload();
    await page.getByTestId("order-label").getByText("1-1/2 × 2.374").waitFor();
    expect(await page.getByLabel("Shaft", { exact: true }).inputValue()).toBe("1.497");

    // The link opens the same measurement in a browser that has never seen it.
    const other = await page
      .context()
      .browser()!
      .newContext({ viewport: { width: 390, height: 844 } });
    const fresh = await other.newPage();
    await fresh.goto(link);
    await fresh.getByTestId("order-label").getByText("1-1/2 × 2.374").waitFor();
    expect(await fresh.getByLabel("Housing bore", { exact: true }).inputValue()).toBe("2.374");
    await other.close();
  });
});
