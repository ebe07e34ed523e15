import { describe, expect, it } from "vitest";
import { roleCan } from "@/lib/rules/role-permissions";
import { navigationFor } from "@/lib/shell/navigation";

describe("role permissions", () => {
  it("lets only supervisors countersign and read the review queue", () => {
    expect(roleCan("supervisor", "entry.countersign")).toBe(true);
    expect(roleCan("researcher", "entry.countersign")).toBe(false);
    expect(roleCan("admin", "entry.countersign")).toBe(false);
    expect(roleCan("supervisor", "review.read")).toBe(true);
  });

  it("lets only admins manage the lab and read the mail catcher", () => {
    expect(roleCan("admin", "lab.manage")).toBe(true);
    expect(roleCan("supervisor", "lab.manage")).toBe(false);
    expect(roleCan("researcher", "mail.read")).toBe(false);
  });

  it("builds each role's navigation from the same table", () => {
    expect(navigationFor("researcher").map((i) => i.label)).toEqual([
      "Bench",
      "Entries",
      "Solution finder",
      "Stocks",
    ]);
    // The stock list is for every role.
    for (const role of ["supervisor", "admin"] as const)
      expect(navigationFor(role).map((i) => i.label)).toContain("Stocks");
    expect(navigationFor("supervisor").map((i) => i.label)).toContain("Review queue");
    expect(navigationFor("admin").map((i) => i.label)).toContain("Lab settings");
  });
});
