import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sequelize } from "@/db";
import { send, signIn, uniqueAddress } from "../helpers/api";
import { ROUTES } from "../helpers/routes";

afterAll(() => sequelize.close());

// Bounded malformed input to every route, as the most and the least privileged caller: whatever arrives, the answer
// is never a 5xx. Strings include NUL, lone surrogates, % escapes and very long runs; bodies are any JSON value.
let admin = "";
let listId = 0;

beforeAll(async () => {
  admin = await signIn("admin@understudy.test");
  listId = (await send("post", "/api/lists", { title: "Fuzzed list" }, { cookie: admin })).body.id;
});

const nasty = fc.oneof(
  fc.string({ maxLength: 40 }),
  fc.string({ unit: "binary", maxLength: 40 }),
  fc.constantFrom(
    "\u0000",
    "\ud800",
    "%FF",
    "%E0%A4%A",
    "1/0",
    "-1",
    "1e308",
    "NaN",
    "../../etc/passwd",
    "<script>",
    "' OR 1=1 --",
    "x".repeat(5000),
  ),
);
const body = fc.oneof(
  fc.jsonValue({ maxDepth: 3 }),
  fc.dictionary(
    fc.constantFrom(
      "title",
      "email",
      "password",
      "number",
      "quantity",
      "partId",
      "standard",
      "action",
      "mapping",
      "name",
      "q",
      "kind",
    ),
    fc.oneof(nasty, fc.integer(), fc.boolean(), fc.constant(null)),
  ),
);

describe("malformed input on every route", () => {
  const endpoints = Object.entries(ROUTES).flatMap(([route, list]) => list.map((endpoint) => ({ route, endpoint })));

  for (const { route, endpoint } of endpoints) {
    it(`${endpoint.method.toUpperCase()} /api/${route} never answers 5xx`, async () => {
      await fc.assert(
        fc.asyncProperty(nasty, body, fc.boolean(), async (text, json, signedIn) => {
          const base = endpoint.path(listId);
          // Each query parameter replaced by the malformed text; bodies replaced by any JSON value.
          const [pathname, query] = base.split("?");
          const params = new URLSearchParams(query ?? "");
          for (const key of params.keys()) params.set(key, text);
          const target = query ? `${pathname}?${params}` : pathname;
          const response = await send(
            endpoint.method,
            target,
            endpoint.method === "get" || endpoint.method === "delete" ? undefined : json,
            {
              cookie: signedIn ? admin : undefined,
              address: uniqueAddress(),
            },
          );
          expect(response.status, `${endpoint.method} ${target} → ${response.status}`).toBeLessThan(500);
        }),
        { numRuns: 12, seed: 20261202 },
      );
    });
  }

  it("answers malformed ids in every [id] segment without a 5xx", async () => {
    const ids = ["%FF", "0", "-1", "1.5", "abc", "9".repeat(30), "%00", "1%2F2"];
    for (const id of ids) {
      for (const path of [
        `/api/parts/${id}`,
        `/api/lists/${id}`,
        `/api/proposals/${id}`,
        `/api/imports/${id}`,
        `/api/photos/${id}`,
        `/api/lists/${listId}/lines/${id}`,
      ]) {
        const response = await send("get", path, undefined, { cookie: admin });
        expect(response.status, `${path} → ${response.status}`).toBeLessThan(500);
      }
    }
  });
});
