import { relations } from "drizzle-orm";
import { auditEvents, invitations, labs, users } from "./labs";
import {
  blockResults,
  entries,
  projects,
  revisions,
  signatures,
  solutionResults,
} from "./notebook";

export const labsRelations = relations(labs, ({ many }) => ({
  users: many(users),
  projects: many(projects),
}));

export const usersRelations = relations(users, ({ one }) => ({
  lab: one(labs, { fields: [users.labId], references: [labs.id] }),
}));

export const invitationsRelations = relations(invitations, ({ one }) => ({
  lab: one(labs, { fields: [invitations.labId], references: [labs.id] }),
  invitedBy: one(users, { fields: [invitations.invitedById], references: [users.id] }),
}));

export const auditEventsRelations = relations(auditEvents, ({ one }) => ({
  actor: one(users, { fields: [auditEvents.actorId], references: [users.id] }),
}));

export const projectsRelations = relations(projects, ({ one, many }) => ({
  lab: one(labs, { fields: [projects.labId], references: [labs.id] }),
  entries: many(entries),
}));

export const entriesRelations = relations(entries, ({ one, many }) => ({
  project: one(projects, { fields: [entries.projectId], references: [projects.id] }),
  author: one(users, { fields: [entries.authorId], references: [users.id] }),
  revisions: many(revisions),
}));

export const revisionsRelations = relations(revisions, ({ one, many }) => ({
  entry: one(entries, { fields: [revisions.entryId], references: [entries.id] }),
  author: one(users, { fields: [revisions.authorId], references: [users.id] }),
  signatures: many(signatures),
}));

export const blockResultsRelations = relations(blockResults, ({ one }) => ({
  entry: one(entries, { fields: [blockResults.entryId], references: [entries.id] }),
  result: one(solutionResults, {
    fields: [blockResults.resultId],
    references: [solutionResults.id],
  }),
}));

export const signaturesRelations = relations(signatures, ({ one }) => ({
  revision: one(revisions, { fields: [signatures.revisionId], references: [revisions.id] }),
  signer: one(users, { fields: [signatures.signerId], references: [users.id] }),
}));
