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
    await page
      .getByLabel("Choose a CSV file")
      .setInputFiles(path.resolve("fixtures/imports/club-interchange-sample.csv"));
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

    await page.getByLabel("Add a part by factory number").fill("cv 3004a");
    await page.getByRole("button", { name: "Add", exact: true }).click();
    await page.getByText("Read as CV-3004-A. Added.").waitFor();
    await page.getByTestId("list-line").filter({ hasText: "CV-3004-A" }).waitFor();

    // The list names no machine serial, and the Model 22's pump changed with the serial: it asks which range.
    await page.getByRole("button", { name: "Add the rest of the assembly" }).first().click();
    await page.getByRole("button", { name: "Serial up to 22-1340" }).click();
    await page
      .getByText("Added 5 more parts of the water pump (Model 22, serial 22-1340), one for each position.")
      .waitFor();
    const lines = await page.getByTestId("list-line").count();
    expect(lines).toBe(6);
    // The early front bearing, under its service number.
    await page.getByTestId("list-line").filter({ hasText: "CV-3003-B" }).waitFor();

    // Removing a line can be undone.
    const gasket = page.getByTestId("list-line").filter({ hasText: "CV-3013-A" });
    await gasket.getByRole("button", { name: "Remove" }).click();
    await page.getByText("Removed CV-3013-A.").waitFor();
    expect(await page.getByTestId("list-line").count()).toBe(lines - 1);
    await page.getByRole("button", { name: "Undo" }).click();
    await page.getByText("CV-3013-A is back on the list.").waitFor();
    expect(await page.getByTestId("list-line").count()).toBe(lines);

    const quantity = page.getByLabel("Quantity of CV-3003-B");
    await quantity.fill("2");
    await quantity.press("Enter");
    await page
      .getByText(/parts in all/)
      .filter({ hasText: `${lines} lines` })
      .waitFor();

    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("link", { name: "Download CSV" }).click(),
    ]);
    const text = await readFile((await download.path())!, "utf8");
    const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), {
      header: true,
      skipEmptyLines: true,
    });
    expect(parsed.data).toHaveLength(lines);
    expect(parsed.data.find((r) => r["Factory number"] === "CV-3003-B")).toMatchObject({
      "Standard designation": "6203-2RS C3",
      "Earlier numbers": "CV-3003-A",
      Quantity: "2",
    });

    // Four more lines with the shop's supplier details: ten lines in all, the size of a usual job.
    const listId = listUrl.split("/").pop();
    const headers = { Origin: APP_URL };
    for (const number of ["HM 210 007", "CV-3008-A", "CV-3012-A", "HM 210 014"]) {
      const added = await page.request.post(`${APP_URL}/api/lists/${listId}/lines`, {
        headers,
        data: { number, quantity: 1, notes: "Check the shaft for wear where the old part ran." },
      });
      expect(added.status()).toBe(201);
      const { lineId } = await added.json();
      await page.request.patch(`${APP_URL}/api/lists/${listId}/lines/${lineId}`, {
        headers,
        data: { supplier: "County Bearings & Seals", supplierNumber: "CB-1740-2RS", unitPrice: "12.40" },
      });
    }

    await page.goto(`${listUrl}/print`);
    expect(await page.getByTestId("sheet-line").count()).toBe(lines + 4);
    await page.getByText("was CV-3003-A").waitFor();
    await page.getByRole("heading", { name: "Before you start" }).waitFor();
    // A ten-line list prints on one sheet of A4 and of US Letter.
    await page.emulateMedia({ media: "print" });
    for (const format of ["A4", "Letter"] as const) {
      const pdf = (await page.pdf({ format, printBackground: false })).toString("latin1");
      expect(pdf.match(/\/Type\s*\/Page(?![s\w])/g) ?? [], format).toHaveLength(1);
    }
    await page.emulateMedia({ media: "screen" });

    // On a phone the lines are cards, with the quantity in reach.
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(listUrl);
    expect(await page.getByTestId("list-line").count()).toBe(lines + 4);
    const phoneQuantity = page.getByLabel("Quantity of CV-3003-B");
    expect(await phoneQuantity.isVisible()).toBe(true);
    expect(await phoneQuantity.inputValue()).toBe("2");
  });
});
