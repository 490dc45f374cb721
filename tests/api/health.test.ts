import { describe, expect, it } from "vitest";
import { send } from "../helpers/api";

describe("GET /api/health", () => {
  it("reports the database, storage and mail as working", async () => {
    const response = await send("get", "/api/health");
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({
      ok: true,
      database: { ok: true },
      storage: { ok: true },
      mail: { ok: true },
    });
  });
});
