import net from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startSecondServer } from "../helpers/second-server";

// A second app server whose database connections pass through a forwarder this test controls: closing the
// forwarder (and cutting the connections through it) is the database going away, as in a restart or an outage,
// without touching the database the other tests use. Opening it again is the database coming back.
const APP_PORT = 3108;
// The forwarder's port is the system's choice the first time (a fixed one can be taken by some connection's own
// end, as ports of that range are handed out to them), and the same one when it opens again.
let forwardPort = 0;
let APP = "";
const target = new URL(process.env.DATABASE_URL!);

let forwarder: net.Server | null = null;
const sockets = new Set<net.Socket>();
let second: Awaited<ReturnType<typeof startSecondServer>> | undefined;

function openForwarder(): Promise<void> {
  forwarder = net.createServer((client) => {
    const upstream = net.connect(Number(target.port), target.hostname);
    for (const s of [client, upstream]) {
      sockets.add(s);
      s.on("close", () => sockets.delete(s));
      s.on("error", () => s.destroy());
    }
    client.pipe(upstream).pipe(client);
  });
  return new Promise((resolve) =>
    forwarder!.listen(forwardPort, "127.0.0.1", () => {
      forwardPort = (forwarder!.address() as net.AddressInfo).port;
      resolve();
    }),
  );
}

function closeForwarder(): Promise<void> {
  for (const s of sockets) s.destroy();
  return new Promise((resolve) => (forwarder ? forwarder.close(() => resolve()) : resolve()));
}

const get = async (pathname: string) => {
  const response = await fetch(`${APP}${pathname}`);
  return { status: response.status, retryAfter: response.headers.get("retry-after"), text: await response.text() };
};

beforeAll(async () => {
  await openForwarder();
  const url = new URL(process.env.DATABASE_URL!);
  url.port = String(forwardPort);
  second = await startSecondServer(APP_PORT, { DATABASE_URL: url.toString(), DB_POOL_ACQUIRE_MS: "3000" });
  APP = second.url;
}, 120_000);

afterAll(async () => {
  second?.kill();
  await closeForwarder();
});

describe("the database going away and coming back", () => {
  it("answers 503 with Retry-After while it is gone, says no more in the health answer, and recovers", async () => {
    expect((await get("/api/parts/lookup?q=CV-3003")).status).toBe(200);

    // Warm several pooled connections, then cut them all: the next requests meet a dead connection or a refused one.
    await Promise.all(Array.from({ length: 4 }, () => get("/api/parts/lookup?q=CV-3003")));
    await closeForwarder();
    for (let i = 0; i < 5; i += 1) {
      const during = await get(`/api/parts/lookup?q=CV-300${i}`);
      expect(during.status, during.text).toBe(503);
      expect(Number(during.retryAfter)).toBeGreaterThan(0);
      expect(JSON.parse(during.text).error).toBe("unavailable");
    }
    const health = await get("/api/health");
    expect(health.status).toBe(503);
    expect(health.text).not.toMatch(/127\.0\.0\.1|ECONN|54398|understudy_test/);

    await openForwarder();
    const deadline = Date.now() + 20_000;
    let after = await get("/api/parts/lookup?q=CV-3003");
    while (after.status !== 200 && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 300));
      after = await get("/api/parts/lookup?q=CV-3003");
    }
    expect(after.status).toBe(200);
  }, 120_000);
});
