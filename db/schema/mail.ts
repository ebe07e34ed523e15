import { sql } from "drizzle-orm";
import {
  bigserial,
  check,
  index,
  integer,
  pgTable,
  text,
  timestamp,
  uuid,
} from "drizzle-orm/pg-core";
import { labs } from "./labs";

/**
 * Notification mails, written in the same transaction as the action they report and sent
 * after it commits, so an unreachable mail server never blocks or undoes an action. A failed
 * send is retried with growing delays and shown to the lab's admins. Only notifications go
 * here: mails that carry a secret (invitation links) are sent directly and never stored.
 */
export const mailOutbox = pgTable(
  "mail_outbox",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    labId: uuid("lab_id").references(() => labs.id, { onDelete: "cascade" }),
    kind: text("kind").notNull(),
    to: text("to_address").notNull(),
    subject: text("subject").notNull(),
    text: text("body_text").notNull(),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    nextAttemptAt: timestamp("next_attempt_at", { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp("sent_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("mail_outbox_pending_idx")
      .on(t.nextAttemptAt)
      .where(sql`${t.sentAt} is null`),
    index("mail_outbox_lab_idx").on(t.labId, t.createdAt),
    check("mail_outbox_attempts_nonnegative", sql`${t.attempts} >= 0`),
  ],
);

export type OutboxMail = typeof mailOutbox.$inferSelect;
