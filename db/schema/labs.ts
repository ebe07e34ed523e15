import { sql } from "drizzle-orm";
import {
  bigserial,
  boolean,
  check,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import { ROLES, type Role, sqlList } from "./enums";

const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();

export const labs = pgTable(
  "labs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    name: text("name").notNull(),
    slug: text("slug").notNull().unique(),
    createdAt: createdAt(),
  },
  (t) => [check("labs_name_not_blank", sql`length(trim(${t.name})) > 0`)],
);

export const users = pgTable(
  "users",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "restrict" }),
    email: text("email").notNull(),
    name: text("name").notNull(),
    passwordHash: text("password_hash").notNull(),
    role: text("role").$type<Role>().notNull(),
    active: boolean("active").notNull().default(true),
    /**
     * Part of every session token of the member; raising it ends all of them at once
     * (sign-out, deactivation, role or password change).
     */
    sessionVersion: integer("session_version").notNull().default(1),
    deactivatedAt: timestamp("deactivated_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("users_email_lower_unique").on(sql`lower(${t.email})`),
    index("users_lab_idx").on(t.labId),
    check("users_role_valid", sql.raw(`role in ${sqlList(ROLES)}`)),
    check("users_email_has_at", sql`position('@' in ${t.email}) > 1`),
    check("users_deactivation_consistent", sql`(${t.active}) = (${t.deactivatedAt} is null)`),
  ],
);

export const invitations = pgTable(
  "invitations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labId: uuid("lab_id")
      .notNull()
      .references(() => labs.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    role: text("role").$type<Role>().notNull(),
    /** SHA-256 of the token in the link; the token itself is only ever in the e-mail. */
    tokenHash: text("token_hash").notNull().unique(),
    invitedById: uuid("invited_by_id")
      .notNull()
      .references(() => users.id),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
    acceptedUserId: uuid("accepted_user_id").references(() => users.id),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    index("invitations_lab_idx").on(t.labId),
    check("invitations_role_valid", sql.raw(`role in ${sqlList(ROLES)}`)),
    check(
      "invitations_acceptance_consistent",
      sql`(${t.acceptedAt} is null) = (${t.acceptedUserId} is null)`,
    ),
  ],
);

/** Failed and successful sign-ins, for throttling repeated failures. */
export const signInAttempts = pgTable(
  "sign_in_attempts",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    email: text("email").notNull(),
    /** Where the attempt came from (the client's address), for per-client limits. */
    clientKey: text("client_key").notNull().default(""),
    succeeded: boolean("succeeded").notNull(),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("sign_in_attempts_email_at_idx").on(sql`lower(${t.email})`, t.at),
    index("sign_in_attempts_client_at_idx").on(t.clientKey, t.at),
  ],
);

export const auditEvents = pgTable(
  "audit_events",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    labId: uuid("lab_id").references(() => labs.id, { onDelete: "cascade" }),
    actorId: uuid("actor_id").references(() => users.id),
    action: text("action").notNull(),
    targetType: text("target_type").notNull(),
    targetId: text("target_id"),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
    details: jsonb("details").$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [index("audit_events_lab_at_idx").on(t.labId, t.at)],
);

export type Lab = typeof labs.$inferSelect;
export type NewLab = typeof labs.$inferInsert;
export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;
export type Invitation = typeof invitations.$inferSelect;
export type NewInvitation = typeof invitations.$inferInsert;
export type AuditEvent = typeof auditEvents.$inferSelect;
