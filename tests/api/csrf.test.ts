import { describe, expect, it } from "vitest";
import { send, signIn } from "../helpers/api";

describe("mutating requests from another origin", () => {
  it("refuses a sign-in posted from a foreign page", async () => {
    const response = await send(
      "post",
      "/api/auth/sign-in",
      { email: "member@understudy.test", password: "understudy-demo" },
      { origin: "http://parts-scam.example" },
    );
    expect(response.status).toBe(403);
    expect(response.body.error).toBe("forbidden_origin");
    expect(response.headers["set-cookie"]).toBeUndefined();
  });

  it("refuses a sign-out that rides on a member's cookie from a foreign page, and the session survives", async () => {
    const cookie = await signIn("member@understudy.test");
    const forged = await send("post", "/api/auth/sign-out", {}, { cookie, origin: "http://parts-scam.example" });
    expect(forged.status).toBe(403);
    expect((await send("get", "/api/auth/me", undefined, { cookie })).status).toBe(200);
  });

  it("refuses a mutating request that names no origin at all", async () => {
    const response = await send(
      "post",
      "/api/auth/sign-up",
      { email: "x@example.org", password: "long enough password" },
      { origin: null },
    );
    expect(response.status).toBe(403);
  });
});
