// @vitest-environment node
/**
 * The entry rules as a table: every state (archived or not) × every kind of member × every
 * action. The expected sets below are the specification (docs/architecture.md, "Entry
 * states"); a change to the rules must change this table on purpose.
 */
import { describe, expect, it } from "vitest";
import {
  ENTRY_ACTIONS,
  type EntryAction,
  type EntryFacts,
  type MemberFacts,
  decideEntryAction,
} from "@/lib/rules/entry-rules";
import type { EntryStatus } from "@/lib/contract/vocabulary";

const LAB = "lab-1";
const AUTHOR = "author-1";
const MEMBERS: Record<string, MemberFacts> = {
  "author (researcher)": { userId: AUTHOR, labId: LAB, role: "researcher" },
  "author (supervisor)": { userId: AUTHOR, labId: LAB, role: "supervisor" },
  "author (admin)": { userId: AUTHOR, labId: LAB, role: "admin" },
  "other researcher": { userId: "u-2", labId: LAB, role: "researcher" },
  "other supervisor": { userId: "u-3", labId: LAB, role: "supervisor" },
  "other admin": { userId: "u-4", labId: LAB, role: "admin" },
  "supervisor of another lab": { userId: "u-5", labId: "lab-2", role: "supervisor" },
};
type Kind = keyof typeof MEMBERS;

// v view, e edit, s submit, a archive, r restore, c countersign, t return, m amend
const CODES: Record<string, EntryAction> = {
  v: "view",
  e: "edit",
  s: "submit",
  a: "archive",
  r: "restore",
  c: "countersign",
  t: "return",
  m: "amend",
};

const author = (live: string, archived: string) => ({ live, archived });
/** [status] → member kind → allowed actions when not archived / when archived. */
const TABLE: Record<EntryStatus, Record<Kind, { live: string; archived: string }>> = {
  draft: {
    "author (researcher)": author("vesa", "vr"),
    "author (supervisor)": author("vesa", "vr"),
    "author (admin)": author("vesa", "vr"),
    "other researcher": author("v", "v"),
    "other supervisor": author("v", "v"),
    "other admin": author("va", "vr"),
    "supervisor of another lab": author("", ""),
  },
  submitted: {
    "author (researcher)": author("v", "vr"),
    "author (supervisor)": author("v", "vr"),
    "author (admin)": author("v", "vr"),
    "other researcher": author("v", "v"),
    "other supervisor": author("vct", "vct"),
    "other admin": author("v", "vr"),
    "supervisor of another lab": author("", ""),
  },
  countersigned: {
    "author (researcher)": author("vam", "vr"),
    "author (supervisor)": author("vam", "vr"),
    "author (admin)": author("vam", "vr"),
    "other researcher": author("v", "v"),
    "other supervisor": author("v", "v"),
    "other admin": author("va", "vr"),
    "supervisor of another lab": author("", ""),
  },
  returned: {
    "author (researcher)": author("vesa", "vr"),
    "author (supervisor)": author("vesa", "vr"),
    "author (admin)": author("vesa", "vr"),
    "other researcher": author("v", "v"),
    "other supervisor": author("v", "v"),
    "other admin": author("va", "vr"),
    "supervisor of another lab": author("", ""),
  },
  amended: {
    "author (researcher)": author("vesa", "vr"),
    "author (supervisor)": author("vesa", "vr"),
    "author (admin)": author("vesa", "vr"),
    "other researcher": author("v", "v"),
    "other supervisor": author("v", "v"),
    "other admin": author("va", "vr"),
    "supervisor of another lab": author("", ""),
  },
};

const entry = (status: EntryStatus, archived: boolean, revisions = 3): EntryFacts => ({
  labId: LAB,
  authorId: AUTHOR,
  status,
  archived,
  currentRevisionNumber: revisions,
  // Countersigned at revision 2 for the states that come after a signature.
  signedRevisionNumber: status === "countersigned" ? revisions : status === "amended" ? 2 : null,
});

const cases = Object.entries(TABLE).flatMap(([status, byKind]) =>
  Object.entries(byKind).flatMap(([kind, expected]) =>
    [false, true].map((archived) => ({
      status: status as EntryStatus,
      kind: kind,
      archived,
      allowed: [...(archived ? expected.archived : expected.live)].map((c) => CODES[c]),
    })),
  ),
);

describe("entry rules: state × member × action", () => {
  it("covers 5 states × 2 archive flags × 7 members × 8 actions", () => {
    expect(cases).toHaveLength(70);
    expect(ENTRY_ACTIONS).toHaveLength(8);
  });

  it.each(cases)("$status (archived: $archived), $kind", ({ status, kind, archived, allowed }) => {
    const got = ENTRY_ACTIONS.filter(
      (action) => decideEntryAction(MEMBERS[kind], entry(status, archived), action).allowed,
    );
    expect(got).toEqual(ENTRY_ACTIONS.filter((a) => allowed.includes(a)));
  });
});

describe("entry rules: how a refusal is reported", () => {
  const researcher = MEMBERS["author (researcher)"];

  it("answers 404 for another lab's entry, never 403", () => {
    expect(
      decideEntryAction(MEMBERS["supervisor of another lab"], entry("submitted", false), "view"),
    ).toEqual({
      allowed: false,
      code: "not_found",
      reason: "Entry not found.",
    });
  });

  it("refuses to save or submit an archived entry with 409 and says why", () => {
    for (const action of ["edit", "submit"] as const) {
      const decision = decideEntryAction(researcher, entry("draft", true), action);
      expect(decision.allowed).toBe(false);
      if (!decision.allowed) {
        expect(decision.code).toBe("conflict");
        expect(decision.reason).toMatch(/archived; restore it before/);
      }
    }
  });

  it("refuses archiving an entry that waits for countersignature (409)", () => {
    const decision = decideEntryAction(researcher, entry("submitted", false), "archive");
    expect(decision).toMatchObject({ allowed: false, code: "conflict" });
  });

  it("refuses a role with 403 and a state with 409", () => {
    expect(
      decideEntryAction(MEMBERS["other researcher"], entry("submitted", false), "countersign"),
    ).toMatchObject({ allowed: false, code: "forbidden" });
    expect(
      decideEntryAction(MEMBERS["author (supervisor)"], entry("submitted", false), "countersign"),
    ).toMatchObject({
      allowed: false,
      code: "forbidden",
      reason: "You cannot countersign your own entry.",
    });
    expect(
      decideEntryAction(MEMBERS["other admin"], entry("submitted", false), "return"),
    ).toMatchObject({ allowed: false, code: "forbidden" });
    expect(
      decideEntryAction(MEMBERS["other supervisor"], entry("draft", false), "countersign"),
    ).toMatchObject({ allowed: false, code: "conflict" });
  });

  it("needs a change before an amendment is submitted", () => {
    const unchanged = { ...entry("amended", false, 2), signedRevisionNumber: 2 };
    expect(decideEntryAction(researcher, unchanged, "submit")).toMatchObject({
      allowed: false,
      code: "conflict",
      reason: "Change something before submitting the amendment.",
    });
    expect(decideEntryAction(researcher, unchanged, "edit").allowed).toBe(true);
  });

  it("needs a saved revision before submitting", () => {
    expect(decideEntryAction(researcher, entry("draft", false, 0), "submit")).toMatchObject({
      allowed: false,
      code: "conflict",
      reason: "Write something before submitting: the entry has no saved revision.",
    });
  });
});
