import { readFile } from "node:fs/promises";
import path from "node:path";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { APP_URL } from "../helpers/api";
import { pagePerTest, signInAs } from "../helpers/browser";

const currentPage = pagePerTest({ width: 1280, height: 900 });

describe("an admin imports the sample spreadsheet through the page", () => {
  it("uploads it, reads the dry run with its rejected rows, and commits", async () => {
    const page = currentPage();
    await signInAs(page, "admin@understudy.test");
    await page.goto(`${APP_URL}/admin/imports`);
    await page.getByLabel("Choose a CSV file").setInputFiles(path.resolve("fixtures/imports/club-interchange-sample.csv"));
    await page.waitForURL(/\/admin\/imports\/\d+$/);
    await page.getByRole("heading", { name: "Dry run: what a commit would do" }).waitFor({ timeout: 20_000 });
    // Rejections depend on the file alone, whatever the catalogue already holds.
    expect(await page.locator('[data-count="rejected"]').innerText()).toBe("7");
    expect(await page.getByTestId("rejected-row").count()).toBe(7);
    await page.getByTestId("rejected-row").filter({ hasText: "Unknown category" }).waitFor();
    await page.getByRole("button", { name: /^Commit \d+ rows$/ }).click();
    await page.getByRole("heading", { name: "What the commit did" }).waitFor({ timeout: 20_000 });
    await page.getByText("Committed ·").waitFor();
  });
});

describe("a shop builds a job list and downloads it", () => {
  it("starts a list, adds a part and the rest of its assembly, and gets a CSV with every line", async () => {
    const page = currentPage();
    await signInAs(page, "club.member2@understudy.test");
    await page.goto(`${APP_URL}/lists`);
    await page.getByLabel("What is the job?").fill("Water pump rebuild, customer's 1948 crawler");
    await page.getByRole("button", { name: "Start the list" }).click();
    await page.waitForURL(/\/lists\/\d+$/);
    const listUrl = page.url();

    await page.getByLabel("Add a part by factory number").fill("cv 3003a");
    await page.getByRole("button", { name: "Add", exact: true }).click();
    await page.getByText("Added under its latest number").waitFor();
    await page.getByTestId("list-line").filter({ hasText: "CV-3003-B" }).waitFor();

    await page.getByRole("button", { name: "Add the rest of the assembly" }).first().click();
    await page.getByText(/Added \d+ more part/).waitFor();
    const lines = await page.getByTestId("list-line").count();
    expect(lines).toBeGreaterThan(1);

    const quantity = page.getByLabel("Quantity of CV-3003-B");
    await quantity.fill("2");
    await quantity.press("Enter");
    await page.getByText(/parts in all/).filter({ hasText: `${lines} lines` }).waitFor();

    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download CSV" }).click()]);
    const text = await readFile((await download.path())!, "utf8");
    const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: true });
    expect(parsed.data).toHaveLength(lines);
    expect(parsed.data.find((r) => r["Factory number"] === "CV-3003-B")).toMatchObject({ "Standard designation": "6203-2RS", Quantity: "2" });

    await page.getByRole("link", { name: "Printable sheet" }).click();
    await page.waitForURL(/\/print$/);
    expect(await page.getByTestId("sheet-line").count()).toBe(lines);
    await page.getByRole("heading", { name: "Pressing and heating bearings" }).waitFor();

    // On a phone the lines are cards, with the quantity in reach.
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(listUrl);
    expect(await page.getByTestId("list-line").count()).toBe(lines);
    const phoneQuantity = page.getByLabel("Quantity of CV-3003-B");
    expect(await phoneQuantity.isVisible()).toBe(true);
    expect(await phoneQuantity.inputValue()).toBe("2");
  });
});
