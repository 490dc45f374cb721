import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sequelize } from "@/db";
import { PERMISSIONS, type Role } from "@/lib/auth/roles";
import { APP_URL, send, signIn } from "../helpers/api";
import { ROUTES, type Door } from "../helpers/routes";

afterAll(() => sequelize.close());

// Every route and page as five identities. Who may pass is worked out from the permissions table in
// lib/auth/roles.ts, never written here: anonymous → 401 (pages: to the sign-in page), a role without the
// permission → 403, a role with it → past the door (any answer but 401/403, and never a 5xx).
type Identity = "anonymous" | "member" | "otherMember" | "moderator" | "admin";
const ROLE_OF: Record<Exclude<Identity, "anonymous">, Role> = {
  member: "member",
  otherMember: "member",
  moderator: "moderator",
  admin: "admin",
};
const cookies: Partial<Record<Identity, string>> = {};
let listId = 0;

// Pages: anonymous visitors are sent to sign in; a role without the permission gets the forbidden page.
const PAGES: Array<{ path: string; door: Door }> = [
  { path: "/", door: "public" },
  { path: "/measure/seal", door: "public" },
  { path: "/lookup?q=CV-3003", door: "public" },
  { path: "/propose", door: "proposals:create" },
  { path: "/proposals", door: "proposals:create" },
  { path: "/lists", door: "lists:manage" },
  { path: "/account", door: "account:use" },
  { path: "/review", door: "proposals:review" },
  { path: "/admin/imports", door: "imports:review-queue" },
  { path: "/audit", door: "audit:read" },
];

function expected(door: Door, who: Identity): "pass" | 401 | 403 {
  if (door === "public") return "pass";
  if (who === "anonymous") return 401;
  if (door === "signed-in") return "pass";
  return (PERMISSIONS[door] as readonly Role[]).includes(ROLE_OF[who]) ? "pass" : 403;
}

function routeFiles(dir = "app/api", prefix = ""): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return routeFiles(full, prefix ? `${prefix}/${name}` : name);
    return name === "route.ts" ? [prefix] : [];
  });
}

beforeAll(async () => {
  const [member, otherMember, moderator, admin] = await Promise.all(
    [
      "club.member6@understudy.test",
      "club.member7@understudy.test",
      "moderator@understudy.test",
      "admin@understudy.test",
    ].map((email) => signIn(email)),
  );
  Object.assign(cookies, { member, otherMember, moderator, admin });
  listId = (await send("post", "/api/lists", { title: "Access matrix list" }, { cookie: member })).body.id;
});

describe("the route × role matrix", () => {
  it("covers every route file under app/api", () => {
    expect(routeFiles().sort()).toEqual(Object.keys(ROUTES).sort());
  });

  for (const [route, endpoints] of Object.entries(ROUTES)) {
    for (const endpoint of endpoints) {
      it(`${endpoint.method.toUpperCase()} /api/${route} (${endpoint.door})`, async () => {
        for (const who of ["anonymous", "member", "otherMember", "moderator", "admin"] as const) {
          const response = await send(endpoint.method, endpoint.path(listId), endpoint.body, {
            cookie: cookies[who as Exclude<Identity, "anonymous">],
          });
          const want = expected(endpoint.door, who);
          const context = `${who}: ${response.status} ${JSON.stringify(response.body).slice(0, 160)}`;
          expect(response.status, context).toBeLessThan(500);
          if (want === "pass") expect([401, 403], context).not.toContain(response.status);
          else expect(response.status, context).toBe(want);
        }
      });
    }
  }

  it("hides one member's list from another (404), and shows it to its owner", async () => {
    expect((await send("get", `/api/lists/${listId}`, undefined, { cookie: cookies.member })).status).toBe(200);
    expect((await send("get", `/api/lists/${listId}`, undefined, { cookie: cookies.otherMember })).status).toBe(404);
    expect((await send("get", `/api/lists/${listId}`, undefined, { cookie: cookies.admin })).status).toBe(404);
  });

  for (const page of PAGES) {
    it(`page ${page.path} (${page.door})`, async () => {
      for (const who of ["anonymous", "member", "otherMember", "moderator", "admin"] as const) {
        let req = request(APP_URL).get(page.path).redirects(0);
        const cookie = cookies[who as Exclude<Identity, "anonymous">];
        if (cookie) req = req.set("Cookie", cookie);
        const response = await req;
        const want = expected(page.door, who);
        const context = `${who}: ${response.status}`;
        if (want === "pass") expect(response.status, context).toBe(200);
        else if (want === 401) {
          expect([303, 307], context).toContain(response.status);
          expect(String(response.headers.location), context).toMatch(/\/sign-in\?next=/);
        } else expect(response.status, context).toBe(403);
      }
    });
  }
});
