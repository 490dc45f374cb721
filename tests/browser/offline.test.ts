import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { APP_URL, send, signIn } from "../helpers/api";
import { pagePerTest } from "../helpers/browser";

// A phone in a shed with no signal: the service worker is on for these tests.
const currentPage = pagePerTest({ width: 390, height: 844 }, { serviceWorkers: "allow" });

/** A member's job list with two lines, made through the API; the browser gets the member's session. */
async function listWithLines(page: Page, email: string, title: string) {
  const cookie = await signIn(email);
  const made = await send("post", "/api/lists", { title }, { cookie });
  expect(made.status).toBe(201);
  const id: number = made.body.id;
  const lineIds: Record<string, number> = {};
  for (const number of ["CV-3004-A", "CV-3008-A"]) {
    const added = await send("post", `/api/lists/${id}/lines`, { number, quantity: 1 }, { cookie });
    expect(added.status).toBe(201);
    lineIds[number] = added.body.lineId;
  }
  const [name, value] = cookie.split("=");
  await page.context().addCookies([{ name, value, url: APP_URL }]);
  return { id, cookie, lineIds };
}

/** Opens a page with a connection and waits until the service worker controls it (and has kept the calculators). */
async function openControlled(page: Page, path: string) {
  await page.goto(`${APP_URL}${path}`);
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null, null, { timeout: 60_000 });
}

const field = (page: Page, label: string) => page.getByLabel(label, { exact: true });

describe("with no connection", () => {
  it("computes a bearing match, edits a job list, and sends the edits when the connection returns", async () => {
    const page = currentPage();
    const list = await listWithLines(page, "club.member5@understudy.test", "Offline: magneto and pump");
    await openControlled(page, "/measure/seal");
    // Opened once with a connection: the page and the list are kept.
    await page.goto(`${APP_URL}/lists/${list.id}`);
    await page.getByTestId("list-line").filter({ hasText: "CV-3008-A" }).waitFor();

    await page.context().setOffline(true);
    // Really offline: the service worker's own fetch of the API fails too.
    expect(
      await page.evaluate(() =>
        fetch("/api/health").then(
          () => "reached",
          () => "failed",
        ),
      ),
    ).toBe("failed");

    // The bearing calculator was never opened: it was kept at install, and works it out on the phone.
    await page.goto(`${APP_URL}/measure/bearing`);
    await page.getByTestId("offline-banner").waitFor();
    await page.getByText("mm", { exact: true }).click();
    await field(page, "Bore (d)").fill("25.03");
    await field(page, "Outside diameter (D)").fill("61.97");
    await field(page, "Width (B)").fill("17");
    // ISO 15:2017, series 63: 6305 is 25 × 62 × 17 mm.
    await page.locator("tbody tr").first().locator("th").getByText("6305").waitFor();

    await page.reload();
    await page.getByTestId("offline-banner").waitFor();
    await page.goto(`${APP_URL}/lists/${list.id}`);
    await page.getByText(/Offline: this is the copy kept on this device, fetched/).waitFor();
    const quantity = page.getByLabel("Quantity of CV-3004-A");
    await quantity.fill("3");
    await quantity.press("Enter");
    await page.getByText("Quantity of CV-3004-A: 1 → 3").waitFor();
    await page.getByLabel("CV-3008-A ordered").click();
    await page.getByText("CV-3008-A: ticked as ordered").waitFor();
    await page.getByLabel("Add a part by factory number").fill("CV-3003-B");
    await page.getByLabel("Qty", { exact: true }).fill("2");
    await page.getByRole("button", { name: "Add", exact: true }).click();
    await page.getByText("Kept 2 × CV-3003-B to add when the connection returns.").waitFor();
    await page.getByText("Waiting to be sent (3)").waitFor();

    // The waiting changes and the edited copy survive a reload with no connection.
    await page.reload();
    await page.getByText("Waiting to be sent (3)").waitFor();
    expect(await page.getByLabel("Quantity of CV-3004-A").inputValue()).toBe("3");

    await page.context().setOffline(false);
    await page.getByText("Sent the changes made offline:").waitFor({ timeout: 20_000 });
    await page.getByTestId("list-line").filter({ hasText: "CV-3003-B" }).waitFor();
    expect(await page.getByText(/Waiting to be sent/).count()).toBe(0);

    const saved = await send("get", `/api/lists/${list.id}`, undefined, { cookie: list.cookie });
    const lines: Array<{ number: string; quantity: number; ordered: boolean }> = saved.body.lines;
    expect(lines.find((l) => l.number === "CV-3004-A")?.quantity).toBe(3);
    expect(lines.find((l) => l.number === "CV-3008-A")?.ordered).toBe(true);
    expect(lines.find((l) => l.number === "CV-3003-B")?.quantity).toBe(2);
  });

  it("does not overwrite a change made elsewhere meanwhile, and says so", async () => {
    const page = currentPage();
    const list = await listWithLines(page, "club.member5@understudy.test", "Offline: a change made twice");
    await openControlled(page, `/lists/${list.id}`);
    await page.reload();
    await page.getByTestId("list-line").filter({ hasText: "CV-3004-A" }).waitFor();

    await page.context().setOffline(true);
    const quantity = page.getByLabel("Quantity of CV-3004-A");
    await quantity.fill("4");
    await quantity.press("Enter");
    await page.getByText("Quantity of CV-3004-A: 1 → 4").waitFor();

    // Meanwhile the shop's other phone sets it to 2.
    const patched = await send(
      "patch",
      `/api/lists/${list.id}/lines/${list.lineIds["CV-3004-A"]}`,
      { quantity: 2 },
      { cookie: list.cookie },
    );
    expect(patched.status).toBe(200);

    await page.context().setOffline(false);
    await page
      .getByText(/CV-3004-A was changed elsewhere while you were offline \(now quantity 2\)/)
      .waitFor({ timeout: 20_000 });
    expect(await page.getByLabel("Quantity of CV-3004-A").inputValue()).toBe("2");
  });

  it("shows a part opened before as the copy kept on the device, and lists it under Kept on this device", async () => {
    const page = currentPage();
    await openControlled(page, "/lookup?q=CV-3004-A");
    const part = page.getByRole("link", { name: "CV-3004-A" }).first();
    await part.waitFor();
    const href = (await part.getAttribute("href")) as string;
    await page.goto(`${APP_URL}${href}`);
    await page.getByRole("heading", { name: "Standard equivalents" }).waitFor();

    await page.context().setOffline(true);
    await page.reload();
    await page.getByText(/Offline: this is the copy of this part kept on this device/).waitFor();
    await page.goto(`${APP_URL}/kept`);
    const kept = page.getByRole("article").filter({ hasText: "CV-3004-A" });
    await kept.getByText(/^Fetched /).waitFor();
    // A page never opened falls back to the offline page, which says what still works.
    await page.goto(`${APP_URL}/machines`);
    await page.getByRole("heading", { name: "You are offline" }).waitFor();
  });
});
