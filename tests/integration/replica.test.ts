import pg from "pg";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sequelize } from "@/db";
import { APP_URL } from "../helpers/api";
import { startSecondServer } from "../helpers/second-server";

// `npm test` starts a streaming replica of the test database (pg_basebackup -R, docker-free-minio-fake/postgres.ts).
// An app server with DATABASE_READ_URLS naming it reads from it; the replica's replay is paused here to catch a
// read that went to the wrong place.
const REPLICA_URL = process.env.TEST_REPLICA_URL!;
let second: Awaited<ReturnType<typeof startSecondServer>>;
let replica: pg.Client;

beforeAll(async () => {
  replica = new pg.Client({ connectionString: REPLICA_URL });
  await replica.connect();
  second = await startSecondServer(3111, { DATABASE_READ_URLS: REPLICA_URL });
}, 120_000);

afterAll(async () => {
  second?.kill();
  await replica?.query("SELECT pg_wal_replay_resume()").catch(() => undefined);
  await replica?.end();
  await sequelize.close();
});

/** Waits until the replica has replayed everything the primary has written so far. */
async function caughtUp() {
  const [{ lsn }] = await sequelize.query<{ lsn: string }>("SELECT pg_current_wal_lsn()::text AS lsn", {
    type: "SELECT" as never,
  });
  const deadline = Date.now() + 10_000;
  for (;;) {
    const { rows } = await replica.query("SELECT pg_last_wal_replay_lsn() >= $1::pg_lsn AS done", [lsn]);
    if (rows[0].done) return;
    if (Date.now() > deadline) throw new Error("The replica did not catch up");
    await new Promise((r) => setTimeout(r, 50));
  }
}

const cookiesOf = (response: { headers: Record<string, unknown> }) =>
  ([] as string[])
    .concat((response.headers["set-cookie"] as string[] | string | undefined) ?? [])
    .map((c) => c.split(";")[0]);

const get = (path: string, cookie: string) => request(second.url).get(path).set("Cookie", cookie);
const post = (path: string, body: object, cookie = "") =>
  request(second.url).post(path).set("Origin", APP_URL).set("Cookie", cookie).send(body);

describe("a read replica", () => {
  it("streams from the primary and refuses writes of its own", async () => {
    expect((await replica.query("SELECT pg_is_in_recovery() AS standby")).rows[0].standby).toBe(true);
    const [{ n }] = await sequelize.query<{ n: string }>(
      "SELECT count(*) AS n FROM pg_stat_replication WHERE state = 'streaming'",
      { type: "SELECT" as never },
    );
    expect(Number(n)).toBeGreaterThanOrEqual(1);
    await expect(replica.query("UPDATE makers SET name = name")).rejects.toThrow(/read-only/);
  });

  it("serves reads from the replica, writes from the primary, and a writer's own reads from the primary", async () => {
    const signedIn = await post("/api/auth/sign-in", {
      email: "club.member7@understudy.test",
      password: "understudy-demo",
    });
    expect(signedIn.status).toBe(200);
    const cookies = cookiesOf(signedIn);
    const session = cookies.find((c) => c.startsWith("understudy_session="))!;
    // The sign-in was a write: the answer tells this browser to read from the primary for a few seconds.
    expect(cookies.some((c) => c.startsWith("understudy_wrote="))).toBe(true);
    await caughtUp();

    await replica.query("SELECT pg_wal_replay_pause()");
    try {
      // A write while the replica stands still: it lands, so it went to the primary.
      const made = await post("/api/lists", { title: "Read from the primary, written to the primary" }, session);
      expect(made.status).toBe(201);
      const wrote = cookiesOf(made).find((c) => c.startsWith("understudy_wrote="))!;
      expect(wrote).toBeTruthy();
      const path = `/api/lists/${made.body.id}`;

      // Without the "just wrote" cookie the read goes to the replica, which has not replayed the new list.
      expect((await get(path, session)).status).toBe(404);
      // The browser that wrote it reads it from the primary.
      const own = await get(path, `${session}; ${wrote}`);
      expect(own.status).toBe(200);
      expect(own.body.title).toBe("Read from the primary, written to the primary");
    } finally {
      await replica.query("SELECT pg_wal_replay_resume()");
    }
    await caughtUp();
    const lists = await get("/api/lists", session);
    expect(lists.body.lists.map((l: { title: string }) => l.title)).toContain(
      "Read from the primary, written to the primary",
    );
  });
});
