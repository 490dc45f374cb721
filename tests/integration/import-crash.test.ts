import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sequelize } from "@/db";
import { send, signIn } from "../helpers/api";
import { startSecondServer } from "../helpers/second-server";

// A second app server on its own port, over the same database and storage, that this test kills mid-commit (the
// server npm test started serves the other tests and the retry).
let second: Awaited<ReturnType<typeof startSecondServer>>;
let SECOND = "";
let admin = "";

afterAll(async () => {
  second?.kill();
  await sequelize.close();
});

beforeAll(async () => {
  admin = await signIn("admin@understudy.test");
  second = await startSecondServer(3109);
  SECOND = second.url;
}, 120_000);

async function status(id: number) {
  return (await send("get", `/api/imports/${id}`, undefined, { cookie: admin })).body as {
    status: string;
    progress: { rows?: number } | null;
    errorMessage: string | null;
  };
}

async function until(id: number, done: (s: Awaited<ReturnType<typeof status>>) => boolean, seconds: number) {
  const deadline = Date.now() + seconds * 1000;
  for (;;) {
    const s = await status(id);
    if (done(s)) return s;
    if (Date.now() > deadline) throw new Error(`import ${id} is still ${s.status}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe("an import commit whose server is killed", () => {
  it("leaves the catalogue untouched and can be committed again at once on the server that is still up", async () => {
    const stamp = Date.now() % 1_000_000;
    const rows = Array.from(
      { length: 30_000 },
      (_, i) => `Corvane Tractor Works,CV-K${stamp}-${i},Test crash row ${i},bearing,6201-2RS,direct`,
    );
    const csv = Buffer.from(["Maker,Part No.,Description,Kind,Standard designation,Fit", ...rows].join("\r\n"));
    const uploaded = await request(SECOND)
      .post("/api/imports")
      .set("Origin", SECOND)
      .set("Cookie", admin)
      .attach("file", csv, { filename: "crash.csv", contentType: "text/csv" });
    expect(uploaded.status).toBe(202);
    const id = uploaded.body.id as number;
    await until(id, (s) => s.status === "parsed", 120);

    expect(
      (await request(SECOND).post(`/api/imports/${id}/commit`).set("Origin", SECOND).set("Cookie", admin).send({}))
        .status,
    ).toBe(202);
    await until(id, (s) => s.status === "committing" && (s.progress?.rows ?? 0) > 0, 60);
    second.kill();

    // Nothing of the cut-off commit landed, and the import is ready to commit again within seconds, not minutes.
    const recovered = await until(id, (s) => s.status === "parsed", 20);
    expect(recovered.errorMessage).toMatch(/interrupted/);
    const [{ n }] = await sequelize.query<{ n: string }>(
      "SELECT count(*) AS n FROM original_parts WHERE number LIKE :p",
      { replacements: { p: `CV-K${stamp}-%` }, type: "SELECT" as never },
    );
    expect(Number(n)).toBe(0);

    expect((await send("post", `/api/imports/${id}/commit`, {}, { cookie: admin })).status).toBe(202);
    expect((await until(id, (s) => s.status !== "committing", 120)).status).toBe("committed");
    expect((await send("post", `/api/imports/${id}/rollback`, {}, { cookie: admin })).status).toBe(200);
  }, 300_000);
});
