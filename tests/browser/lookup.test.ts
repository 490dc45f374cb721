import { describe, expect, it } from "vitest";
import { APP_URL } from "../helpers/api";
import { pagePerTest } from "../helpers/browser";

const currentPage = pagePerTest({ width: 390, height: 844 });

describe("looking up a factory number", () => {
  it("finds a demo number typed with a typo, opens it and reads the standard equivalent", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/`);
    const box = page.getByRole("combobox");
    await box.fill("cv 3O03a"); // O for 0, no dashes
    await page.getByRole("option").filter({ hasText: "CV-3003-A" }).first().waitFor();
    await box.press("ArrowDown");
    await box.press("Enter");
    await page.waitForURL(/\/parts\/\d+$/);
    await page.getByRole("heading", { level: 1, name: "CV-3003-A" }).waitFor();
    await page
      .getByTestId("cross")
      .first()
      .getByText(/^6\d{3}/)
      .waitFor();
  });

  it("takes a partial number and shows the numbers that start with it, each with its best standard part", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/`);
    const box = page.getByRole("combobox");
    await box.fill("CV-30");
    await box.press("Enter");
    await page.waitForURL(/\/lookup\?q=CV-30/);
    const results = page.getByTestId("result");
    await results.first().waitFor();
    const first = await results.evaluateAll((items) =>
      items.slice(0, 10).map((li) => li.getAttribute("data-matched-by")),
    );
    expect(first).toEqual(Array(10).fill("prefix"));
    const card = results.filter({ hasText: "CV-3003-A" }).first();
    expect(await card.getByTestId("best").innerText()).toMatch(/Order\s+6203-2RS C3/);
  });

  it("shows the results with scripts off, sent with the page", async () => {
    const page = currentPage();
    await page
      .context()
      .browser()!
      .newContext({ javaScriptEnabled: false })
      .then(async (context) => {
        const bare = await context.newPage();
        await bare.goto(`${APP_URL}/lookup?q=${encodeURIComponent("water pump bearing model 22")}`);
        expect(await bare.getByTestId("result").count()).toBeGreaterThan(3);
        expect(await bare.getByTestId("result").first().getAttribute("data-matched-by")).toBe("words");
        await context.close();
      });
  });

  it("shows the full results on a shareable page", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/lookup?q=${encodeURIComponent("hm 210 OO7")}`);
    await page
      .getByRole("link", { name: /HM 210 007/ })
      .first()
      .waitFor();
  });
});
