import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sequelize } from "@/db";
import { APP_URL, send, signIn } from "../helpers/api";

afterAll(() => sequelize.close());

let member: string;

beforeAll(async () => {
  member = await signIn("club.member5@understudy.test");
});

/** A body sent exactly as given, bytes and all, as a script or a broken client might. */
async function raw(path: string, body: string | Buffer) {
  const response = await fetch(`${APP_URL}${path}`, {
    method: "POST",
    headers: { Origin: APP_URL, Cookie: member, "Content-Type": "application/json" },
    body: typeof body === "string" ? body : new Uint8Array(body),
  });
  return { status: response.status, body: (await response.json()) as { field?: string } };
}

describe("text that is not text", () => {
  it("refuses a NUL character in a JSON string with 400 naming the field, and stores nothing", async () => {
    const title = `Fan hub\u0000 ${Date.now()}`;
    const response = await raw("/api/lists", JSON.stringify({ title }));
    expect(response.status).toBe(400);
    expect(response.body.field).toBe("title");
    const [row] = await sequelize.query<{ n: string }>("SELECT count(*) AS n FROM job_lists WHERE title LIKE :t", {
      replacements: { t: `Fan hub%${title.slice(-6)}` },
      type: "SELECT" as never,
    });
    expect(Number(row.n)).toBe(0);
  });

  it("refuses a lone surrogate in a JSON string", async () => {
    const response = await raw("/api/lists", '{"title":"Water pump \\ud800 rebuild"}');
    expect(response.status).toBe(400);
    expect(response.body.field).toBe("title");
  });

  it("refuses a body that is not UTF-8", async () => {
    // {"title":"<FF FE>pump list"}: bytes that no UTF-8 text contains, which a lenient decoder turns into U+FFFD.
    const response = await raw(
      "/api/lists",
      Buffer.concat([Buffer.from('{"title":"'), Buffer.from([0xff, 0xfe]), Buffer.from('pump list"}')]),
    );
    expect(response.status).toBe(400);
    expect(response.body.field).toBe("body");
  });

  it("refuses a NUL in a query string", async () => {
    for (const [path, field] of [
      ["/api/seals/match?shaft=1%00&bore=2&unit=in", "shaft"],
      ["/api/parts/lookup?q=CV-3003%00", "q"],
    ]) {
      const response = await send("get", path);
      expect(response.status).toBe(400);
      expect(response.body.field).toBe(field);
    }
  });

  it("answers a malformed escape in a path with 400, not the framework's 500", async () => {
    for (const path of ["/api/parts/%FF", "/api/lists/%E0%A4%A"]) {
      const response = await send("get", path, undefined, { cookie: member });
      expect(response.status).toBe(400);
      expect(response.body.error).toBe("validation_failed");
    }
  });
});
