import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { Proposal, ProposalPhoto, sequelize } from "@/db";
import { getObject } from "@/lib/storage/s3";
import { APP_URL, send, signIn } from "../helpers/api";
import { jpegFrom, proposeWithPhoto } from "../helpers/proposals";
import { pagePerTest, signInAs } from "../helpers/browser";
import { waitForMail } from "../helpers/mail";

const currentPage = pagePerTest({ width: 1280, height: 900 });
const MEMBER = "club.member5@understudy.test";
const newNumber = () => `BRW-${randomUUID().slice(0, 6).toUpperCase()}`;

afterAll(() => sequelize.close());

// Each test makes what it needs: a retry, or one test run alone, finds the same start.
describe("a community cross, from the member's bench to the catalogue", () => {
  it("a member proposes a cross with a photo dropped on the drop zone, sent without the camera's data", async () => {
    const page = currentPage();
    const number = newNumber();
    await signInAs(page, MEMBER);
    await page.goto(`${APP_URL}/propose`);

    await page.getByText("It is not in the catalogue yet").click();
    await page.getByLabel("Maker", { exact: true }).selectOption({ label: "Corvane Tractor Works" });
    await page.getByLabel("Factory number", { exact: true }).fill(number);
    await page.getByLabel("What it is", { exact: true }).fill("Fan shaft bearing, front");
    await page.getByLabel("Kind of part", { exact: true }).selectOption("bearing");

    await page.getByLabel("Designation", { exact: true }).fill("6205-2RS");
    await page
      .getByRole("button", { name: /^6205-2RS/ })
      .first()
      .click();
    await page.getByTestId("picked").getByText("6205-2RS").waitFor();

    await page.getByTestId("fit-direct").click();
    await page.getByRole("button", { name: "Add a measurement" }).click();
    await page.getByLabel("Measured", { exact: true }).fill("24.98");

    // A JPEG carrying an EXIF block (as phone photos do, with the place they were taken), dropped on the zone.
    await page.evaluate(async () => {
      const canvas = document.createElement("canvas");
      canvas.width = 320;
      canvas.height = 240;
      const g = canvas.getContext("2d")!;
      g.fillStyle = "#8a5d12";
      g.fillRect(0, 0, 320, 240);
      g.fillStyle = "#fff";
      g.fillRect(100, 60, 120, 120);
      const jpeg = new Uint8Array(
        await (await new Promise<Blob>((r) => canvas.toBlob((b) => r(b!), "image/jpeg"))).arrayBuffer(),
      );
      const payload = new TextEncoder().encode("Exif\0\0MM\0*\0\0\0\x08\0\0GPS-SECRET-PLACE");
      const app1 = new Uint8Array([0xff, 0xe1, (payload.length + 2) >> 8, (payload.length + 2) & 0xff, ...payload]);
      const withExif = new Uint8Array([...jpeg.slice(0, 2), ...app1, ...jpeg.slice(2)]);
      const file = new File([withExif], "stamping.jpg", { type: "image/jpeg" });
      const data = new DataTransfer();
      data.items.add(file);
      const zone = document.querySelector('[data-testid="photo-drop"]')!;
      for (const type of ["dragenter", "dragover", "drop"])
        zone.dispatchEvent(new DragEvent(type, { bubbles: true, cancelable: true, dataTransfer: data }));
    });
    await page.locator('[data-testid="photo-item"][data-status="done"]').waitFor({ timeout: 15_000 });

    await page.getByRole("button", { name: "Send for review" }).click();
    await page.getByText("Thank you. Your proposal is in the review queue.").waitFor();

    await page.goto(`${APP_URL}/proposals`);
    const card = page.getByTestId("proposal").filter({ hasText: number });
    await card.getByText("Waiting for review").waitFor();

    // What reached storage is the picture without its EXIF block (the browser rewrites it before upload).
    const proposal = await Proposal.findOne({ where: { status: "pending" }, order: [["id", "DESC"]] });
    const photo = await ProposalPhoto.findOne({ where: { proposalId: proposal!.id } });
    const stored = Buffer.from((await getObject(photo!.objectKey)).body).toString("latin1");
    expect(stored.startsWith("\xff\xd8")).toBe(true);
    expect(stored).not.toContain("GPS-SECRET-PLACE");
    expect(stored).not.toContain("Exif");
  });

  it("a moderator approves a proposal from the queue, seeing its photo, and the member is told", async () => {
    const page = currentPage();
    const number = newNumber();
    await page.goto(`${APP_URL}/`);
    await proposeWithPhoto(await signIn(MEMBER), number, await jpegFrom(page));
    await signInAs(page, "moderator@understudy.test");
    await page.goto(`${APP_URL}/review`);
    await page.getByLabel("Number, designation or member", { exact: true }).fill(number);
    await page.getByRole("button", { name: "Show" }).click();
    await page.waitForURL(/q=BRW/);
    await page.getByTestId("queue-row").getByRole("link", { name: number }).click();
    await page.getByRole("heading", { level: 1, name: new RegExp(number) }).waitFor();

    const photo = page.getByTestId("review-photo");
    await photo.waitFor();
    await page.waitForFunction((img) => (img as HTMLImageElement).complete, await photo.elementHandle());
    expect(await photo.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBe(320);

    await page.getByRole("button", { name: "Approve" }).click();
    await page.waitForURL(/\/review\?done=approved/);
    await page.getByText("Approved: the cross is in the catalogue now").waitFor();

    const mail = await waitForMail(MEMBER, "Your cross is in the catalogue");
    expect(mail.text).toContain(number);
  });

  it("the part page shows an approved cross, with its photo, to anyone", async () => {
    const page = currentPage();
    const number = newNumber();
    await page.goto(`${APP_URL}/`);
    const id = await proposeWithPhoto(await signIn(MEMBER), number, await jpegFrom(page));
    const decided = await send(
      "post",
      `/api/proposals/${id}/decision`,
      { action: "approve" },
      { cookie: await signIn("moderator@understudy.test") },
    );
    expect(decided.status).toBe(200);
    await page.goto(`${APP_URL}/lookup?q=${encodeURIComponent(number)}`);
    await page
      .getByRole("link", { name: new RegExp(number) })
      .first()
      .click();
    await page.getByRole("heading", { level: 1, name: number }).waitFor();
    const cross = page.getByTestId("cross").filter({ hasText: "6205-2RS" });
    await cross.waitFor();
    await cross.getByRole("img", { name: "Photo of the fitted part" }).waitFor();
  });
});
