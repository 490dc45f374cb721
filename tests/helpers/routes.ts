import type { Permission } from "@/lib/auth/roles";

/** Who may pass: a permission from lib/auth/roles.ts, anyone, or anyone signed in. */
export type Door = Permission | "public" | "signed-in";

export interface Endpoint {
  method: "get" | "post" | "patch" | "delete";
  path: (listId: number) => string;
  door: Door;
  body?: unknown;
}

// The route files under app/api, each with the requests that exercise it. Bodies are empty or invalid on purpose:
// a request that gets past the door is then refused as bad input (400) or as missing (404), and writes nothing.
export const ROUTES: Record<string, Endpoint[]> = {
  account: [{ method: "patch", path: () => "/api/account", door: "account:use", body: { notifyByEmail: "maybe" } }],
  audit: [{ method: "get", path: () => "/api/audit", door: "audit:read" }],
  "auth/me": [{ method: "get", path: () => "/api/auth/me", door: "signed-in" }],
  "auth/password-reset/confirm": [
    { method: "post", path: () => "/api/auth/password-reset/confirm", door: "public", body: {} },
  ],
  "auth/password-reset/request": [
    { method: "post", path: () => "/api/auth/password-reset/request", door: "public", body: {} },
  ],
  "auth/resend-verification": [
    { method: "post", path: () => "/api/auth/resend-verification", door: "public", body: {} },
  ],
  "auth/sign-in": [{ method: "post", path: () => "/api/auth/sign-in", door: "public", body: {} }],
  "auth/sign-out": [],
  "auth/sign-up": [{ method: "post", path: () => "/api/auth/sign-up", door: "public", body: {} }],
  "auth/verify-email": [{ method: "post", path: () => "/api/auth/verify-email", door: "public", body: {} }],
  "bearings/decode": [{ method: "get", path: () => "/api/bearings/decode?designation=6205", door: "public" }],
  "bearings/match": [{ method: "get", path: () => "/api/bearings/match?bore=25&od=52", door: "public" }],
  "belts/decode": [{ method: "get", path: () => "/api/belts/decode?designation=B60", door: "public" }],
  "belts/drive": [{ method: "get", path: () => "/api/belts/drive?large=10&small=5&center=24&unit=in", door: "public" }],
  "belts/identify": [{ method: "get", path: () => "/api/belts/identify?top=16.3&unit=mm", door: "public" }],
  "crosses/[id]/confirmations": [
    { method: "post", path: () => "/api/crosses/999999/confirmations", door: "proposals:create", body: {} },
  ],
  health: [{ method: "get", path: () => "/api/health", door: "public" }],
  "import-mappings": [
    { method: "get", path: () => "/api/import-mappings", door: "imports:review-queue" },
    { method: "post", path: () => "/api/import-mappings", door: "imports:review-queue", body: {} },
  ],
  "imports/[id]/commit": [
    { method: "post", path: () => "/api/imports/999999/commit", door: "imports:review-queue", body: {} },
  ],
  "imports/[id]/rejected.csv": [
    { method: "get", path: () => "/api/imports/999999/rejected.csv", door: "imports:review-queue" },
  ],
  "imports/[id]/rollback": [
    { method: "post", path: () => "/api/imports/999999/rollback", door: "imports:commit", body: {} },
  ],
  "imports/[id]": [
    { method: "get", path: () => "/api/imports/999999", door: "imports:review-queue" },
    { method: "patch", path: () => "/api/imports/999999", door: "imports:review-queue", body: {} },
    { method: "delete", path: () => "/api/imports/999999", door: "imports:review-queue" },
  ],
  "imports/[id]/rows": [{ method: "get", path: () => "/api/imports/999999/rows", door: "imports:review-queue" }],
  imports: [{ method: "get", path: () => "/api/imports", door: "imports:review-queue" }],
  "lists/[id]/export.csv": [
    { method: "get", path: (listId) => `/api/lists/${listId}/export.csv`, door: "lists:manage" },
  ],
  "lists/[id]/lines/[lineId]/restore": [
    { method: "post", path: (listId) => `/api/lists/${listId}/lines/999999/restore`, door: "lists:manage", body: {} },
  ],
  "lists/[id]/lines/[lineId]/assembly": [
    { method: "post", path: (listId) => `/api/lists/${listId}/lines/999999/assembly`, door: "lists:manage", body: {} },
  ],
  "lists/[id]/lines/[lineId]": [
    {
      method: "patch",
      path: (listId) => `/api/lists/${listId}/lines/999999`,
      door: "lists:manage",
      body: { quantity: 0 },
    },
    { method: "delete", path: (listId) => `/api/lists/${listId}/lines/999999`, door: "lists:manage" },
  ],
  "lists/[id]/lines": [
    { method: "post", path: (listId) => `/api/lists/${listId}/lines`, door: "lists:manage", body: {} },
  ],
  "lists/[id]": [
    { method: "get", path: (listId) => `/api/lists/${listId}`, door: "lists:manage" },
    { method: "patch", path: (listId) => `/api/lists/${listId}`, door: "lists:manage", body: { title: "" } },
  ],
  "lists/[id]/share": [
    { method: "post", path: (listId) => `/api/lists/${listId}/share`, door: "lists:manage", body: {} },
  ],
  lists: [
    { method: "get", path: () => "/api/lists", door: "lists:manage" },
    { method: "post", path: () => "/api/lists", door: "lists:manage", body: {} },
  ],
  "parts/[id]": [{ method: "get", path: () => "/api/parts/999999", door: "public" }],
  "parts/lookup": [{ method: "get", path: () => "/api/parts/lookup?q=CV-3003", door: "public" }],
  "photos/[id]": [{ method: "get", path: () => "/api/photos/999999", door: "public" }],
  "seals/match": [{ method: "get", path: () => "/api/seals/match?shaft=35&bore=52", door: "public" }],
  "felts/size": [{ method: "get", path: () => "/api/felts/size?shaft=30&bore=40&width=5", door: "public" }],
  "packing/size": [{ method: "get", path: () => "/api/packing/size?shaft=20&bore=32", door: "public" }],
  "plugs/match": [{ method: "get", path: () => "/api/plugs/match?bore=38", door: "public" }],
  "keys/woodruff": [{ method: "get", path: () => "/api/keys/woodruff?number=606", door: "public" }],
  "keys/woodruff/match": [
    { method: "get", path: () => "/api/keys/woodruff/match?width=0.19&diameter=0.75&unit=in", door: "public" },
  ],
  "keys/parallel": [{ method: "get", path: () => "/api/keys/parallel?shaft=25", door: "public" }],
  "pins/taper": [{ method: "get", path: () => "/api/pins/taper?number=4", door: "public" }],
  "pins/taper/match": [{ method: "get", path: () => "/api/pins/taper/match?largeEnd=0.25&unit=in", door: "public" }],
  "threads/identify": [{ method: "get", path: () => "/api/threads/identify?diameter=6&pitch=1", door: "public" }],
  "threads/grease-fittings": [{ method: "get", path: () => "/api/threads/grease-fittings", door: "public" }],
  "chain/decode": [{ method: "get", path: () => "/api/chain/decode?number=40", door: "public" }],
  "chain/identify": [
    { method: "get", path: () => "/api/chain/identify?pitch=0.5&roller=0.31&unit=in", door: "public" },
  ],
  "chain/links": [
    { method: "get", path: () => "/api/chain/links?number=40&teeth1=15&teeth2=30&center=20&unit=in", door: "public" },
  ],
  "gaskets/template.svg": [
    { method: "get", path: () => "/api/gaskets/template.svg?outline=circle&od=100", door: "public" },
  ],
  "seals/press-fit": [{ method: "get", path: () => "/api/seals/press-fit?bore=47&sealOd=47.1", door: "public" }],
  "seals/shaft": [{ method: "get", path: () => "/api/seals/shaft?shaft=35", door: "public" }],
  "standard-parts": [{ method: "get", path: () => "/api/standard-parts?q=6205", door: "public" }],
  "proposals/[id]/decision": [
    { method: "post", path: () => "/api/proposals/999999/decision", door: "proposals:review", body: {} },
  ],
  "proposals/[id]": [
    { method: "get", path: () => "/api/proposals/999999", door: "proposals:create" },
    { method: "patch", path: () => "/api/proposals/999999", door: "proposals:create", body: {} },
    { method: "delete", path: () => "/api/proposals/999999", door: "proposals:create" },
  ],
  proposals: [
    { method: "get", path: () => "/api/proposals?mine=1", door: "proposals:create" },
    { method: "get", path: () => "/api/proposals", door: "proposals:review" },
    { method: "post", path: () => "/api/proposals", door: "proposals:create", body: {} },
  ],
  "units/nominal": [{ method: "get", path: () => "/api/units/nominal?value=30", door: "public" }],
  "uploads/presign": [{ method: "post", path: () => "/api/uploads/presign", door: "proposals:create", body: {} }],
  "users/[id]": [{ method: "patch", path: () => "/api/users/nobody", door: "accounts:set-role", body: {} }],
  users: [{ method: "get", path: () => "/api/users", door: "accounts:list" }],
};
