import request from "supertest";
import { APP_URL, send } from "./api";

/** Uploads a spreadsheet to POST /api/imports as the app's import page does (multipart, same origin). */
export function upload(cookie: string, bytes: Buffer, name = "club.csv", fields: Record<string, string> = {}) {
  let req = request(APP_URL).post("/api/imports").set("Origin", APP_URL);
  if (cookie) req = req.set("Cookie", cookie);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach("file", bytes, { filename: name, contentType: "text/csv" });
}

/** Polls the import until the server-side work has finished. */
export async function settled(cookie: string, id: number) {
  const deadline = Date.now() + 30_000;
  for (;;) {
    const { body } = await send("get", `/api/imports/${id}`, undefined, { cookie });
    if (!["uploaded", "parsing", "committing"].includes(body.status)) return body;
    if (Date.now() > deadline) throw new Error(`Import ${id} still ${body.status}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}
