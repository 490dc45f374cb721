import { describe, expect, it } from "vitest";
import { send, signIn } from "../helpers/api";

describe("GET /api/users (moderators and admins)", () => {
  it("answers 401 without a session", async () => {
    expect((await send("get", "/api/users")).status).toBe(401);
  });

  it("answers 403 to a member", async () => {
    const cookie = await signIn("member@understudy.test");
    const response = await send("get", "/api/users", undefined, { cookie });
    expect(response.status).toBe(403);
    expect(response.body.error).toBe("forbidden");
  });

  it("lists the accounts for a moderator", async () => {
    const cookie = await signIn("moderator@understudy.test");
    const response = await send("get", "/api/users", undefined, { cookie });
    expect(response.status).toBe(200);
    expect(response.body.users).toEqual(
      expect.arrayContaining([expect.objectContaining({ email: "admin@understudy.test", role: "admin" })]),
    );
    expect(JSON.stringify(response.body)).not.toContain("password");
  });
});

describe("PATCH /api/users/{id} (admins)", () => {
  async function memberId(cookie: string): Promise<string> {
    const { body } = await send("get", "/api/users", undefined, { cookie });
    return body.users.find((u: { email: string }) => u.email === "member@understudy.test").id;
  }

  it("answers 403 to a moderator", async () => {
    const cookie = await signIn("moderator@understudy.test");
    const response = await send("patch", `/api/users/${await memberId(cookie)}`, { role: "admin" }, { cookie });
    expect(response.status).toBe(403);
  });

  it("answers an unknown role with 400 naming the field", async () => {
    const cookie = await signIn("admin@understudy.test");
    const response = await send("patch", `/api/users/${await memberId(cookie)}`, { role: "owner" }, { cookie });
    expect(response.status).toBe(400);
    expect(response.body.field).toBe("role");
  });

  it("answers an unknown account with 404", async () => {
    const cookie = await signIn("admin@understudy.test");
    const response = await send("patch", "/api/users/no-such-account", { role: "member" }, { cookie });
    expect(response.status).toBe(404);
  });
});

describe("role changes in the audit log", () => {
  it("records who changed whose role, from what to what, and nothing when the role stays the same", async () => {
    const admin = await signIn("admin@understudy.test");
    const { body } = await send("get", "/api/users", undefined, { cookie: admin });
    const target = body.users.find((u: { email: string }) => u.email === "club.member1@understudy.test");
    expect((await send("patch", `/api/users/${target.id}`, { role: "moderator" }, { cookie: admin })).status).toBe(200);
    expect((await send("patch", `/api/users/${target.id}`, { role: "moderator" }, { cookie: admin })).status).toBe(200);
    expect((await send("patch", `/api/users/${target.id}`, { role: "member" }, { cookie: admin })).status).toBe(200);
    const events = (await send("get", "/api/audit?limit=200", undefined, { cookie: admin })).body.events.filter(
      (e: { action: string; subjectId: string }) => e.action === "account.role" && e.subjectId === target.id,
    );
    expect(events).toEqual([
      expect.objectContaining({
        actor: "admin@understudy.test",
        subjectEmail: "club.member1@understudy.test",
        before: { role: "moderator" },
        after: { role: "member" },
      }),
      expect.objectContaining({ before: { role: "member" }, after: { role: "moderator" } }),
    ]);
  });
});
