import { describe, expect, it } from "vitest";
import { hasPermission, PERMISSIONS, ROLES } from "@/lib/auth/roles";

describe("roles and permissions", () => {
  it("lets every role use its own account", () => {
    for (const role of ROLES) expect(hasPermission(role, "account:use")).toBe(true);
  });

  it("keeps reviewing to moderators and admins", () => {
    expect(hasPermission("member", "proposals:review")).toBe(false);
    expect(hasPermission("moderator", "proposals:review")).toBe(true);
    expect(hasPermission("admin", "proposals:review")).toBe(true);
  });

  it("keeps committing imports, setting roles and reading the audit log to admins", () => {
    for (const permission of ["imports:commit", "accounts:set-role", "audit:read"] as const) {
      expect(PERMISSIONS[permission]).toEqual(["admin"]);
    }
  });

  it("gives an admin every permission a moderator has, and a moderator every one a member has", () => {
    for (const permission of Object.keys(PERMISSIONS) as Array<keyof typeof PERMISSIONS>) {
      if (hasPermission("member", permission)) expect(hasPermission("moderator", permission)).toBe(true);
      if (hasPermission("moderator", permission)) expect(hasPermission("admin", permission)).toBe(true);
    }
  });
});
