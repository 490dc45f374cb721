export const ROLES = ["member", "moderator", "admin"] as const;
export type Role = (typeof ROLES)[number];

// Code asks for a permission, never a role name; this table is the one place that links them.
export const PERMISSIONS = {
  "account:use": ["member", "moderator", "admin"],
  "proposals:create": ["member", "moderator", "admin"],
  "lists:manage": ["member", "moderator", "admin"],
  "accounts:list": ["moderator", "admin"],
  "proposals:review": ["moderator", "admin"],
  "imports:review-queue": ["moderator", "admin"],
  "imports:commit": ["admin"],
  "accounts:set-role": ["admin"],
  "audit:read": ["admin"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function hasPermission(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
