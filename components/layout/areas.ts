import type { Permission } from "@/lib/auth/roles";

export interface Area {
  label: string;
  href: string;
  /**
   * Shown only to accounts holding this permission; member areas are also shown to visitors, as an invitation to join.
   */
  permission?: Permission;
  /** Areas whose work has not shipped yet are listed, marked, and not linked. */
  ready: boolean;
}

export const AREAS: Area[] = [
  { label: "Find by number", href: "/", ready: true },
  { label: "Machines", href: "/machines", ready: true },
  { label: "Measure a part", href: "/measure/bearing", ready: true },
  { label: "Propose a cross", href: "/propose", permission: "proposals:create", ready: true },
  { label: "Job lists", href: "/lists", permission: "lists:manage", ready: true },
  { label: "Review queue", href: "/review", permission: "proposals:review", ready: true },
  { label: "Imports", href: "/admin/imports", permission: "imports:review-queue", ready: true },
];
