// @vitest-environment node
import { and, asc, eq, sql } from "drizzle-orm";
import { Client } from "pg";
import { beforeAll, describe, expect, it } from "vitest";
import { insertProject } from "@/db/queries/projects";
import { auditEvents, signInAttempts, signatures } from "@/db/schema";
import type { Actor } from "@/lib/access/actor";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { signedContentHash } from "@/lib/document/signed-content";
import { AppError } from "@/lib/errors";
import { drainOutbox } from "@/lib/mail/outbox";
import { createEntry } from "@/lib/notebook/entries";
import {
  countersignEntry,
  getReviewQueue,
  returnEntry,
  startAmendment,
  submitEntry,
} from "@/lib/notebook/review";
import { getEntryHistory, getReviewView } from "@/lib/notebook/review-view";
import { getCurrentContent } from "@/lib/notebook/revisions";
import { saveEntryContent } from "@/lib/notebook/save-entry";
import { verifyRevision } from "@/lib/notebook/verification";
import { getDb } from "@/lib/server/database";
import { caughtMessagesTo, createLabWithMembers, ownerDb, TEST_PASSWORD } from "../support/db";

const paragraph = (text: string) => ({ type: "paragraph", content: [{ type: "text", text }] });
const doc = (...nodes: unknown[]) => ({ type: "doc", content: nodes });
const kcl = (molality: number) => ({
  type: "solutionBlock",
  attrs: defaultSolutionBlockInput({
    blockId: "blk-kcl-review",
    name: "KCl bath",
    components: [{ formula: "KCl", amount: molality, unit: "mol/kg" }],
  }),
});

async function errorOf(promise: Promise<unknown>): Promise<AppError> {
  const e = await promise.then(
    () => null,
    (x: unknown) => x,
  );
  expect(e).toBeInstanceOf(AppError);
  return e as AppError;
}

const sign = (revision: number, password = TEST_PASSWORD) => ({
  revision,
  password,
  meaning: "witnessed" as const,
  comment: "Seen at the bench.",
});

async function auditActions(entryId: string) {
  const rows = await getDb()
    .select({ action: auditEvents.action, details: auditEvents.details })
    .from(auditEvents)
    .where(eq(auditEvents.targetId, entryId))
    // Insertion order: without it PostgreSQL may return the rows in any order.
    .orderBy(asc(auditEvents.id));
  return rows;
}

describe("countersigning, returns and amendments", () => {
  let author: Actor;
  let supervisor: Actor;
  let secondSupervisor: Actor;
  let admin: Actor;
  let projectId: string;

  beforeAll(async () => {
    const { members, lab } = await createLabWithMembers([
      "admin",
      "supervisor",
      "supervisor",
      "researcher",
    ]);
    author = members.researcher;
    supervisor = members.supervisor;
    secondSupervisor = members.supervisor2;
    admin = members.admin;
    projectId = (
      await insertProject(getDb(), {
        labId: lab.id,
        name: "Review series",
        createdById: admin.userId,
      })
    ).id;
  });

  async function submittedEntry(title: string, reviewer?: Actor) {
    const { id } = await createEntry(author, { projectId, title });
    await saveEntryContent(author, id, {
      baseRevision: 0,
      title,
      content: doc(paragraph("Electrolyte prepared as below."), kcl(0.1)),
    });
    await submitEntry(author, id, reviewer ? { reviewerId: reviewer.userId } : {});
    return id;
  }

  it("asks the chosen supervisor by mail and puts the entry in that supervisor's queue only", async () => {
    const id = await submittedEntry("Chosen reviewer", secondSupervisor);
    await drainOutbox();
    const mails = await caughtMessagesTo(secondSupervisor.email);
    const mine = mails.filter((m) => m.subject === "Review requested: Chosen reviewer");
    expect(mine).toHaveLength(1);
    expect(mine[0].text).toContain(`/review/${id}`);
    expect(
      (await caughtMessagesTo(supervisor.email)).filter((m) =>
        m.subject.includes("Chosen reviewer"),
      ),
    ).toHaveLength(0);
    expect((await getReviewQueue(secondSupervisor)).map((q) => q.entryId)).toContain(id);
    expect((await getReviewQueue(supervisor)).map((q) => q.entryId)).not.toContain(id);
    await errorOf(getReviewQueue(author)).then((e) => expect(e.status).toBe(403));
  });

  it("countersigns with the password: one signature with the hash of the signed content, then read-only", async () => {
    const id = await submittedEntry("To be signed");
    const signed = await countersignEntry(supervisor, id, sign(1));
    const [row] = await getDb().select().from(signatures).where(eq(signatures.entryId, id));
    const current = await getCurrentContent(author, id);
    expect(row).toMatchObject({
      revisionNumber: 1,
      signerId: supervisor.userId,
      signerName: supervisor.name,
      meaning: "witnessed",
      comment: "Seen at the bench.",
    });
    expect(row.contentHash).toBe(
      signedContentHash({ title: current.title, content: current.content, attachments: [] }),
    );
    expect(signed.contentHash).toBe(row.contentHash);
    const edit = await errorOf(
      saveEntryContent(author, id, {
        baseRevision: 1,
        title: "To be signed",
        content: doc(paragraph("changed")),
      }),
    );
    expect(edit.status).toBe(409);
    expect(edit.message).toMatch(/countersigned; change it through an amendment/);
    const verification = await verifyRevision(author, id, 1);
    expect(verification).toMatchObject({ intact: true, chain: { unbroken: true, revisions: 1 } });
    expect(verification.signatures).toEqual([
      expect.objectContaining({ valid: true, signerName: supervisor.name }),
    ]);
    await drainOutbox();
    expect(
      (await caughtMessagesTo(author.email)).some(
        (m) => m.subject === "Countersigned: To be signed",
      ),
    ).toBe(true);
    const actions = (await auditActions(id)).map((a) => a.action);
    expect(actions).toEqual(
      expect.arrayContaining([
        "entry.created",
        "entry.saved",
        "entry.submitted",
        "entry.countersigned",
      ]),
    );
  });

  it("refuses, with 409/403/422 and an audit event: a second signature, a stale revision, a wrong password, the author, a researcher, an admin", async () => {
    const id = await submittedEntry("Refusals");
    const wrong = await errorOf(countersignEntry(supervisor, id, sign(1, "not-my-password")));
    expect(wrong.status).toBe(422);
    expect(wrong.fieldErrors?.password).toBeDefined();
    const failures = await getDb()
      .select()
      .from(signInAttempts)
      .where(
        and(
          eq(signInAttempts.email, supervisor.email.toLowerCase()),
          eq(signInAttempts.succeeded, false),
        ),
      );
    expect(failures).toHaveLength(1);
    expect((await errorOf(countersignEntry(supervisor, id, sign(2)))).status).toBe(409);
    expect((await errorOf(countersignEntry(author, id, sign(1)))).status).toBe(403);
    expect((await errorOf(countersignEntry(admin, id, sign(1)))).status).toBe(403);
    await countersignEntry(supervisor, id, sign(1));
    const again = await errorOf(countersignEntry(secondSupervisor, id, sign(1)));
    expect(again.status).toBe(409);
    const refused = (await auditActions(id)).filter((a) => a.action === "signature.refused");
    expect(refused.map((r) => (r.details as { code: string }).code)).toEqual([
      "invalid_input",
      "conflict",
      "forbidden",
      "forbidden",
      "conflict",
    ]);
  });

  it("refuses a supervisor countersigning their own entry", async () => {
    const { id } = await createEntry(supervisor, { projectId, title: "My own" });
    await saveEntryContent(supervisor, id, {
      baseRevision: 0,
      title: "My own",
      content: doc(paragraph("x")),
    });
    await submitEntry(supervisor, id);
    const own = await errorOf(countersignEntry(supervisor, id, sign(1)));
    expect(own.status).toBe(403);
    expect(own.message).toBe("You cannot countersign your own entry.");
  });

  it("another lab sees neither the entry nor its review (404)", async () => {
    const id = await submittedEntry("Private review");
    const other = await createLabWithMembers(["supervisor", "researcher"]);
    expect((await errorOf(countersignEntry(other.members.supervisor, id, sign(1)))).status).toBe(
      404,
    );
    expect((await errorOf(getReviewView(other.members.supervisor, id))).status).toBe(404);
    expect((await getReviewQueue(other.members.supervisor)).map((q) => q.entryId)).not.toContain(
      id,
    );
  });

  it("two supervisors countersigning at once produce exactly one signature", async () => {
    const id = await submittedEntry("Race");
    const results = await Promise.allSettled([
      countersignEntry(supervisor, id, sign(1)),
      countersignEntry(secondSupervisor, id, sign(1)),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual(["fulfilled", "rejected"]);
    const rejected = results.find((r) => r.status === "rejected") as PromiseRejectedResult;
    expect((rejected.reason as AppError).status).toBe(409);
    expect(await getDb().select().from(signatures).where(eq(signatures.entryId, id))).toHaveLength(
      1,
    );
  });

  it("returns with a required comment; the author edits and resubmits", async () => {
    const id = await submittedEntry("Returned once");
    const noComment = await errorOf(returnEntry(supervisor, id, { revision: 1, comment: " " }));
    expect(noComment.status).toBe(422);
    expect(noComment.fieldErrors?.comment).toEqual(["Say what the author should change."]);
    await returnEntry(supervisor, id, { revision: 1, comment: "State the KCl lot number." });
    const saved = await saveEntryContent(author, id, {
      baseRevision: 1,
      title: "Returned once",
      content: doc(paragraph("KCl lot 4417."), kcl(0.1)),
    });
    expect(saved.revision).toBe(2);
    await submitEntry(author, id);
    const history = await getEntryHistory(author, id);
    expect(history.events.map((e) => e.kind)).toEqual(
      expect.arrayContaining(["revision", "submitted", "returned"]),
    );
    expect(history.events.find((e) => e.kind === "returned")?.text).toBe(
      "State the KCl lot number.",
    );
    await drainOutbox();
    const mail = (await caughtMessagesTo(author.email)).find(
      (m) => m.subject === "Returned for changes: Returned once",
    );
    expect(mail?.text).toContain("State the KCl lot number.");
  });

  it("an edit after countersignature is an amendment with a reason that needs its own signature", async () => {
    const id = await submittedEntry("Amended later");
    await countersignEntry(supervisor, id, sign(1));
    expect((await errorOf(startAmendment(author, id, { reason: "" }))).status).toBe(422);
    await startAmendment(author, id, {
      reason: "The balance was out of calibration; corrected mass.",
    });
    expect((await errorOf(submitEntry(author, id))).message).toBe(
      "Change something before submitting the amendment.",
    );
    const saved = await saveEntryContent(author, id, {
      baseRevision: 1,
      title: "Amended later",
      content: doc(paragraph("Electrolyte prepared as below."), kcl(0.11)),
    });
    expect(saved.revision).toBe(2);
    const history = await getEntryHistory(author, id);
    expect(history.events.find((e) => e.kind === "amendment revision")).toMatchObject({
      revision: 2,
      text: "Amends revision 1: The balance was out of calibration; corrected mass.",
    });
    await submitEntry(author, id);
    const view = await getReviewView(supervisor, id);
    expect(view.baselineRevision).toBe(1);
    const block = view.comparison.blocks.find((b) => b.blockId === "blk-kcl-review")!;
    expect(block.status).toBe("changed");
    expect(block.inputs.find((r) => r.label === "Component 1")).toMatchObject({
      before: "KCl 0.1 mol/kg",
      after: "KCl 0.11 mol/kg",
      changed: true,
    });
    expect(block.results.find((r) => r.label === "I / mol kg⁻¹")).toMatchObject({
      before: "0.1000",
      after: "0.1100",
      changed: true,
    });
    await countersignEntry(supervisor, id, sign(2));
    const verification = await verifyRevision(author, id, 2);
    expect(verification.chain).toEqual({ unbroken: true, revisions: 2, problems: [] });
    // The first signed revision stays readable and verifiable forever.
    expect((await verifyRevision(author, id, 1)).signatures[0].valid).toBe(true);
  });

  it("the database refuses to change a signed revision, its signature or its stored results", async () => {
    const id = await submittedEntry("Tamper-proof");
    await countersignEntry(supervisor, id, sign(1));
    const message = (e: unknown) =>
      String((e as { cause?: Error }).cause?.message ?? (e as Error).message);
    const attempt = (statement: ReturnType<typeof sql>) =>
      ownerDb() // the triggers hold even for the owner; the app role may not try at all
        .execute(statement)
        .then(() => "applied", message);
    expect(
      await attempt(sql`update revisions set title = 'forged' where entry_id = ${id}`),
    ).toMatch(/immutable/);
    expect(await attempt(sql`delete from revisions where entry_id = ${id}`)).toMatch(/immutable/);
    expect(
      await attempt(sql`update signatures set meaning = 'approved' where entry_id = ${id}`),
    ).toMatch(/immutable/);
    expect(await attempt(sql`delete from signatures where entry_id = ${id}`)).toMatch(/immutable/);
    expect(
      await attempt(
        sql`update solution_results set ionic_strength_molal = 1 where id in (select result_id from block_results where entry_id = ${id})`,
      ),
    ).toMatch(/immutable/);
    expect(await attempt(sql`delete from block_results where entry_id = ${id}`)).toMatch(
      /immutable/,
    );
    expect(
      await attempt(sql`update entries set signed_revision_number = null where id = ${id}`),
    ).toMatch(/cannot move back/);
  });

  it("verification shows a revision altered behind the database's back as altered", async () => {
    const id = await submittedEntry("Altered behind the back");
    await countersignEntry(supervisor, id, sign(1));
    // Only an owner who disables the guard can do this; the verification must notice.
    const owner = new Client({ connectionString: process.env.DATABASE_OWNER_URL });
    await owner.connect();
    try {
      await owner.query("alter table revisions disable trigger revisions_immutable");
      await owner.query("update revisions set title = 'Altered' where entry_id = $1", [id]);
      await owner.query("alter table revisions enable trigger revisions_immutable");
    } finally {
      await owner.end();
    }
    const verification = await verifyRevision(author, id, 1);
    expect(verification.intact).toBe(false);
    expect(verification.signatures[0].valid).toBe(false);
    expect(verification.chain.unbroken).toBe(false);
    expect(verification.chain.problems).toEqual(["Revision 1 no longer matches its stored hash."]);
  });
});
