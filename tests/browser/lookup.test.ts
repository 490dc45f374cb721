import { describe, it } from "vitest";
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
    await page.getByTestId("cross").first().getByText(/^6\d{3}/).waitFor();
  });

  it("shows the full results on a shareable page", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/lookup?q=${encodeURIComponent("hm 210 OO7")}`);
    await page.getByRole("link", { name: /HM 210 007/ }).first().waitFor();
  });
});
