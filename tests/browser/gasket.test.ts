import { describe, expect, it } from "vitest";
import { APP_URL } from "../helpers/api";
import { pagePerTest } from "../helpers/browser";

const currentPage = pagePerTest({ width: 390, height: 844 });
const field = (label: string) => currentPage().getByLabel(label, { exact: true });

// CSS Values and Units Level 3: 1 in = 96 px = 25.4 mm, so a length of L mm is L × 96 / 25.4 CSS pixels.
const px = (mm: number) => (mm * 96) / 25.4;

describe("drawing a gasket template", () => {
  it("draws a round gasket with four holes on a bolt circle and prints it at full size", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/measure/gasket`);
    await page.getByText("mm", { exact: true }).click();
    await field("Outside diameter").fill("120");
    await field("Hole in the middle").fill("60");
    await field("How many").fill("4");
    await field("Bolt circle").fill("100");
    await field("Hole diameter").fill("10");
    await page
      .getByTestId("order-label")
      .getByText("Gasket Ø120 mm, bore Ø60, 4 holes Ø10 on Ø100, 0.8 mm fibre")
      .waitFor();
    // The preview is drawn in the browser by the same engine: four holes and a bore cut from the outline.
    const preview = await page.getByTestId("gasket-preview").locator("path").first().getAttribute("d");
    expect(preview?.match(/M/g)).toHaveLength(6);

    // The SVG file the page offers is the gasket's own size, in millimetres.
    const svgHref = await page.getByRole("link", { name: "Download the SVG" }).getAttribute("href");
    const svg = await (await page.request.get(`${APP_URL}${svgHref}`)).text();
    expect(svg).toMatch(/<svg [^>]*width="120mm" height="120mm"/);

    await page.getByRole("link", { name: "Print at full size on A4" }).click();
    await page.waitForURL(/\/measure\/gasket\/print\?/);
    await page.emulateMedia({ media: "print" });
    // In print, the cut line is 120 mm across: 453.5 CSS px, as the printer will lay it down at 100 %.
    // The geometry's box, without the cut line's own width (a locator's boundingBox would include the stroke).
    const box = (testId: string) =>
      page.getByTestId(testId).evaluate((el) => {
        const r = (el.tagName === "svg" ? el.querySelector("path")! : el).getBoundingClientRect();
        return { width: r.width, height: r.height };
      });
    const outline = await box("gasket-outline");
    expect(outline.width).toBeCloseTo(px(120), 0);
    expect(outline.height).toBeCloseTo(px(120), 0);
    expect((await box("check-bar")).width).toBeCloseTo(px(100), 0);
    // One A4 sheet (ISO 216: 210 × 297 mm = 595.28 × 841.89 pt), the page's own size, nothing scaled to fit.
    const pdf = (await page.pdf({ preferCSSPageSize: true, printBackground: false })).toString("latin1");
    expect(pdf.match(/\/Type\s*\/Page(?![s\w])/g) ?? []).toHaveLength(1);
    const [, w, h] = /\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/.exec(pdf)!;
    expect(Number(w)).toBeCloseTo(595.28, 0);
    expect(Number(h)).toBeCloseTo(841.89, 0);
  });

  it("names the field that breaks the template, and tiles a large gasket over several pages", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/measure/gasket`);
    await page.getByText("mm", { exact: true }).click();
    await field("Outside diameter").fill("120");
    await field("Bolt circle").fill("118");
    await field("Hole diameter").fill("10");
    await page.getByText("runs past the gasket's outside edge").waitFor();
    expect(await field("Bolt circle").getAttribute("aria-invalid")).toBe("true");

    await page.goto(`${APP_URL}/measure/gasket/print?unit=mm&outline=rect&width=300&height=200&radius=10&paper=letter`);
    await expect.poll(() => page.locator("section[aria-label^='Page']").count()).toBe(2);
    await page.getByText("Lay the ⊕ marks of neighbouring pages over each other and tape.").first().waitFor();
  });
});
