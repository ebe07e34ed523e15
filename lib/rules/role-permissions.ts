import type { Role } from "@/db/schema/enums";

/**
 * What each role may do. The single table every server-side check consults; the UI reads
 * it too, but only to hide what would be refused anyway.
 */
const PERMISSIONS = {
  "lab.read": ["researcher", "supervisor", "admin"],
  "entry.read": ["researcher", "supervisor", "admin"],
  "entry.write": ["researcher", "supervisor", "admin"],
  "entry.countersign": ["supervisor"],
  "review.read": ["supervisor"],
  "solution.search": ["researcher", "supervisor", "admin"],
  "lab.manage": ["admin"],
  "audit.read": ["admin"],
  "mail.read": ["admin"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function roleCan(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
