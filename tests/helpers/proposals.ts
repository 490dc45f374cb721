import { randomUUID } from "node:crypto";
import type { Page } from "playwright-core";
import { Maker, StandardPart } from "@/db";
import { send } from "./api";

/** A 320 × 240 JPEG drawn by the browser, as a phone's photo arrives after the page prepared it. */
export async function jpegFrom(page: Page): Promise<Buffer> {
  const bytes = await page.evaluate(async () => {
    const canvas = document.createElement("canvas");
    canvas.width = 320;
    canvas.height = 240;
    const g = canvas.getContext("2d")!;
    g.fillStyle = "#8a5d12";
    g.fillRect(0, 0, 320, 240);
    const blob = await new Promise<Blob>((r) => canvas.toBlob((b) => r(b!), "image/jpeg"));
    return [...new Uint8Array(await blob.arrayBuffer())];
  });
  return Buffer.from(bytes);
}

/**
 * A member's proposal of a new part crossed to 6205-2RS, sent through the API with one photo, so that a browser test of
 * the review or the part page does not depend on another test having proposed it.
 */
export async function proposeWithPhoto(cookie: string, number: string, jpeg: Buffer): Promise<number> {
  const maker = await Maker.findOne({ where: { name: "Corvane Tractor Works" } });
  const standard = await StandardPart.findOne({ where: { kind: "bearing", designation: "6205-2RS" } });
  const grant = await send(
    "post",
    "/api/uploads/presign",
    { contentType: "image/jpeg", size: jpeg.length, fileName: "bench.jpg" },
    { cookie },
  );
  if (grant.status !== 201) throw new Error(`No upload grant: ${grant.status} ${JSON.stringify(grant.body)}`);
  const put = await fetch(grant.body.uploadUrl, {
    method: "PUT",
    body: new Uint8Array(jpeg),
    headers: grant.body.headers,
  });
  if (!put.ok) throw new Error(`The photo did not reach storage: ${put.status}`);
  const sent = await send(
    "post",
    "/api/proposals",
    {
      original: {
        mode: "new",
        makerId: maker!.id,
        number,
        description: "Fan shaft bearing, front",
        category: "bearing",
      },
      standard: { mode: "existing", standardPartId: standard!.id },
      fit: "direct",
      measurements: [{ dimension: "inner", value: 24.98, unit: "mm" }],
      notes: "Fitted on the club's tractor.",
      photoIds: [grant.body.photoId],
    },
    { cookie },
  );
  if (sent.status !== 201) throw new Error(`The proposal was not taken: ${sent.status} ${JSON.stringify(sent.body)}`);
  return sent.body.proposal.id as number;
}

/**
 * A member's proposal of a new part (number made unique) crossed to a new standard part entered by its designation,
 * as the proposal form sends it; answers the API's response.
 */
export async function proposeNewStandard(
  cookie: string,
  input: { category: string; kind: string; designation: string; template?: string; description?: string },
) {
  const maker = await Maker.findOne({ order: [["id", "ASC"]] });
  const number = `TST-${input.kind.slice(0, 3).toUpperCase()}-${randomUUID().slice(0, 6).toUpperCase()}`;
  const response = await send(
    "post",
    "/api/proposals",
    {
      original: {
        mode: "new",
        makerId: maker!.id,
        number,
        description: input.description ?? "Test part",
        category: input.category,
      },
      standard: { mode: "new", kind: input.kind, designation: input.designation, template: input.template },
      fit: "direct",
      measurements: [],
      notes: "",
    },
    { cookie },
  );
  return { number, response };
}
