import request from "supertest";
import { afterAll, describe, expect, it } from "vitest";
import { QueryTypes } from "sequelize";
import { sequelize } from "@/db";
import { APP_URL, send, signIn } from "../helpers/api";

afterAll(() => sequelize.close());

const get = (path: string, etag?: string) => {
  const req = request(APP_URL).get(path);
  return etag ? req.set("If-None-Match", etag) : req;
};

const version = async () =>
  (await sequelize.query<{ version: string }>("SELECT version FROM catalogue_version", {
    type: QueryTypes.SELECT,
    plain: true,
  }))!.version;

describe("answers a CDN may keep", () => {
  for (const path of ["/api/parts/lookup?q=CV-3003", "/api/standard-parts?q=6205&kind=bearing"]) {
    it(`gives ${path} an ETag and a public, short-lived policy, and a 304 to a request that has it`, async () => {
      const first = await get(path);
      expect(first.status).toBe(200);
      expect(first.headers["cache-control"]).toBe("public, max-age=0, s-maxage=60, stale-while-revalidate=600");
      const etag = first.headers.etag;
      expect(etag).toMatch(/^W\/".+"$/);
      const again = await get(path, etag);
      expect(again.status).toBe(304);
      expect(again.text ?? "").toBe("");
      expect(again.headers.etag).toBe(etag);
      // Another question has another ETag.
      expect((await get(`${path}7`)).headers.etag).not.toBe(etag);
    });
  }

  it("keeps a part's answer until the catalogue changes, and changes every ETag when it does", async () => {
    const found = await get("/api/parts/lookup?q=CV-3003-A");
    const partId = found.body.results[0].id;
    const part = await get(`/api/parts/${partId}`);
    expect(part.status).toBe(200);
    expect((await get(`/api/parts/${partId}`, part.headers.etag)).status).toBe(304);

    await sequelize.query("UPDATE makers SET name = name WHERE id = (SELECT min(id) FROM makers)");
    // The server hears of the commit a moment later (a notice from PostgreSQL): within a second, not a minute.
    const deadline = Date.now() + 1_000;
    let changed = await get(`/api/parts/${partId}`, part.headers.etag);
    while (changed.status === 304 && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 20));
      changed = await get(`/api/parts/${partId}`, part.headers.etag);
    }
    expect(changed.status).toBe(200);
    expect(changed.headers.etag).not.toBe(part.headers.etag);
    expect((await get("/api/parts/lookup?q=CV-3003-A", found.headers.etag)).status).toBe(200);
  });

  it("raises the catalogue's version once per committed change, not before the commit, not on a rollback", async () => {
    const before = BigInt(await version());
    await sequelize.transaction(async (transaction) => {
      await sequelize.query("UPDATE makers SET name = name", { transaction });
      await sequelize.query("UPDATE machines SET model = model", { transaction });
      // Not yet committed: nobody else sees a new version, so no ETag can name data that is not visible.
      expect(BigInt(await version())).toBe(before);
    });
    expect(BigInt(await version())).toBe(before + 1n);
    await sequelize
      .transaction(async (transaction) => {
        await sequelize.query("UPDATE makers SET name = name", { transaction });
        throw new Error("rolled back");
      })
      .catch(() => undefined);
    expect(BigInt(await version())).toBe(before + 1n);
    const [touches] = await sequelize.query("SELECT count(*)::int AS n FROM catalogue_touches");
    expect(touches).toEqual([{ n: 0 }]);
  });

  it("lets anyone keep a calculator's answer for an hour, with a 304 for the same sizes", async () => {
    const path = "/api/bearings/decode?designation=6205-2RS";
    const first = await get(path);
    expect(first.headers["cache-control"]).toBe("public, max-age=3600, stale-while-revalidate=86400");
    expect((await get(path, first.headers.etag)).status).toBe(304);
    // A calculator that also lists the catalogue's parts of the size follows the catalogue's policy.
    const match = await get("/api/bearings/match?bore=25&od=52&unit=mm");
    expect(match.headers["cache-control"]).toContain("s-maxage=60");
  });
});

describe("answers nobody may keep", () => {
  it("marks what is personal, and refusals, private and not to be stored", async () => {
    const cookie = await signIn("club.member4@understudy.test");
    for (const path of ["/api/lists", "/api/auth/me", "/api/proposals?mine=1"]) {
      const response = await send("get", path, undefined, { cookie });
      expect(response.status, path).toBe(200);
      expect(response.headers["cache-control"], path).toBe("private, no-store");
      expect(response.headers.etag, path).toBeUndefined();
    }
    const refused = await get("/api/bearings/match?bore=abc&od=52");
    expect(refused.status).toBe(400);
    expect(refused.headers["cache-control"]).toBe("private, no-store");
  });
});
