import type { Role } from "@/db/schema/enums";
import { roleCan } from "@/lib/rules/role-permissions";

export interface NavEntry {
  href: string;
  label: string;
}

/** The main navigation for a role: everyone writes and searches; review and lab settings by role. */
export function navigationFor(role: Role): NavEntry[] {
  const items: NavEntry[] = [
    { href: "/", label: "Bench" },
    { href: "/entries", label: "Entries" },
    { href: "/solutions", label: "Solution finder" },
    { href: "/stocks", label: "Stocks" },
  ];
  if (roleCan(role, "review.read")) items.push({ href: "/review", label: "Review queue" });
  if (roleCan(role, "lab.manage")) items.push({ href: "/lab", label: "Lab settings" });
  return items;
}
