import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, send, sessionCookie, uniqueAddress, uniqueEmail } from "../helpers/api";
import { startSecondServer } from "../helpers/second-server";

// Two app servers over one database and one photo store, as behind a load balancer with no sticky sessions: what
// is made through one is seen through the other, because an app server keeps nothing of its own.
let second: Awaited<ReturnType<typeof startSecondServer>>;
let B = "";

beforeAll(async () => {
  second = await startSecondServer(3110);
  B = second.url;
}, 120_000);

afterAll(() => second?.kill());

/** A request to the second server, sent as the app's pages send it (same-site Origin). */
function toB(method: "get" | "post" | "delete", path: string, body?: unknown, cookie?: string, address?: string) {
  let req = request(B)[method](path).set("Origin", APP_URL);
  if (cookie) req = req.set("Cookie", cookie);
  if (address) req = req.set("X-Forwarded-For", address);
  return body === undefined ? req : req.set("Content-Type", "application/json").send(body as object);
}

describe("two app servers over one database", () => {
  it("knows a session begun on one server on the other, and ends it on both", async () => {
    const signedIn = await send("post", "/api/auth/sign-in", {
      email: "club.member6@understudy.test",
      password: "understudy-demo",
    });
    expect(signedIn.status).toBe(200);
    const cookie = sessionCookie(signedIn);
    const me = await toB("get", "/api/auth/me", undefined, cookie);
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe("club.member6@understudy.test");
    expect((await toB("post", "/api/auth/sign-out", {}, cookie)).status).toBeLessThan(300);
    expect((await send("get", "/api/auth/me", undefined, { cookie })).status).toBe(401);
  });

  it("counts failed sign-ins made on both servers against one limit", async () => {
    const email = uniqueEmail("two-servers");
    await send("post", "/api/auth/sign-up", { email, password: "a long and careful passphrase" });
    const address = uniqueAddress();
    for (let attempt = 1; attempt <= 5; attempt += 1) {
      const response =
        attempt % 2
          ? await send("post", "/api/auth/sign-in", { email, password: `guess-${attempt}` }, { address })
          : await toB("post", "/api/auth/sign-in", { email, password: `guess-${attempt}` }, undefined, address);
      expect(response.status).toBe(401);
    }
    expect((await toB("post", "/api/auth/sign-in", { email, password: "guess-6" }, undefined, address)).status).toBe(
      429,
    );
  });

  it("shows a job list made through one server, and an edit made through the other", async () => {
    const signedIn = await toB("post", "/api/auth/sign-in", {
      email: "club.member6@understudy.test",
      password: "understudy-demo",
    });
    const cookie = sessionCookie(signedIn);
    const made = await send("post", "/api/lists", { title: "Made on the first server" }, { cookie });
    expect(made.status).toBe(201);
    const added = await toB("post", `/api/lists/${made.body.id}/lines`, { number: "CV-3004-A", quantity: 2 }, cookie);
    expect(added.status).toBe(201);
    const seen = await send("get", `/api/lists/${made.body.id}`, undefined, { cookie });
    expect(seen.body.title).toBe("Made on the first server");
    expect(seen.body.lines.map((l: { number: string; quantity: number }) => [l.number, l.quantity])).toEqual([
      ["CV-3004-A", 2],
    ]);
  });

  it("follows an import uploaded to one server on the other, to its dry run's counts", async () => {
    const signedIn = await send("post", "/api/auth/sign-in", {
      email: "admin@understudy.test",
      password: "understudy-demo",
    });
    const cookie = sessionCookie(signedIn);
    const stamp = Date.now() % 1_000_000;
    const csv = Buffer.from(
      [
        "Maker,Part No.,Description,Kind,Standard designation,Fit",
        ...Array.from(
          { length: 50 },
          (_, i) => `Corvane Tractor Works,CV-T${stamp}-${i},Two servers ${i},bearing,6201-2RS,direct`,
        ),
      ].join("\r\n"),
    );
    const uploaded = await request(APP_URL)
      .post("/api/imports")
      .set("Origin", APP_URL)
      .set("Cookie", cookie)
      .attach("file", csv, { filename: "two-servers.csv", contentType: "text/csv" });
    expect(uploaded.status).toBe(202);
    const id = uploaded.body.id as number;
    const deadline = Date.now() + 60_000;
    let seen: { status: string; counts?: Record<string, number> } = { status: "uploaded" };
    while (["uploaded", "parsing"].includes(seen.status) && Date.now() < deadline) {
      seen = (await toB("get", `/api/imports/${id}`, undefined, cookie)).body;
      await new Promise((r) => setTimeout(r, 200));
    }
    expect(seen.status).toBe("parsed");
    expect(seen.counts).toMatchObject({ newParts: 50 });
    expect((await toB("delete", `/api/imports/${id}`, undefined, cookie)).status).toBeLessThan(300);
  });
});
