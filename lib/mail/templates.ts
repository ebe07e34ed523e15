/** Mail texts, in Ionleaf's own words. Plain text first: it reads well in any client. */
export function invitationMail(input: {
  labName: string;
  inviterName: string;
  role: string;
  link: string;
  expiresAt: Date;
}) {
  const expires = input.expiresAt.toISOString().slice(0, 16).replace("T", " ");
  const text = [
    `${input.inviterName} has invited you to join ${input.labName} on Ionleaf as a ${input.role}.`,
    "",
    "Ionleaf is the lab's electrochemistry notebook: entries, solution blocks that compute",
    "ionic strength and activities, cell preparations and countersignatures.",
    "",
    `Set your password and join: ${input.link}`,
    "",
    `The link works once and until ${expires} UTC. If you did not expect this, ignore it.`,
  ].join("\n");
  return { subject: `Join ${input.labName} on Ionleaf`, text };
}

/**
 * Sent instead of an invitation when the address already has an account in another lab, so
 * the inviting admin learns nothing about other labs' members and the owner of the address
 * learns what happened. It carries no link: one account belongs to one lab.
 */
export function alreadyRegisteredMail(input: { labName: string; inviterName: string }) {
  const text = [
    `${input.inviterName} tried to invite this address to ${input.labName} on Ionleaf.`,
    "",
    "This address already has an Ionleaf account in another lab, and an account belongs to",
    "one lab, so no invitation link was made. If you want to join, ask them to invite another",
    "address of yours; if you did not expect this, ignore it.",
  ].join("\n");
  return { subject: `An invitation to ${input.labName} on Ionleaf`, text };
}

const entryLink = (appUrl: string, path: string) => new URL(path, appUrl).toString();

export function reviewRequestedMail(input: {
  appUrl: string;
  entryId: string;
  entryTitle: string;
  authorName: string;
  revision: number;
  amendment: boolean;
}) {
  const what = input.amendment ? "an amendment of a countersigned entry" : "an entry";
  const text = [
    `${input.authorName} has submitted ${what} for your countersignature:`,
    "",
    `  ${input.entryTitle} (revision ${input.revision})`,
    "",
    `Review it: ${entryLink(input.appUrl, `/review/${input.entryId}`)}`,
    "",
    "You can countersign it with your password, or return it to the author with a comment.",
  ].join("\n");
  return { subject: `Review requested: ${input.entryTitle}`, text };
}

export function reviewDecidedMail(input: {
  appUrl: string;
  entryId: string;
  entryTitle: string;
  reviewerName: string;
  revision: number;
  decision: "countersigned" | "returned";
  comment: string;
}) {
  const head =
    input.decision === "countersigned"
      ? `${input.reviewerName} has countersigned revision ${input.revision} of your entry:`
      : `${input.reviewerName} has returned revision ${input.revision} of your entry for changes:`;
  const text = [
    head,
    "",
    `  ${input.entryTitle}`,
    "",
    ...(input.comment ? [`Comment: ${input.comment}`, ""] : []),
    `Open it: ${entryLink(input.appUrl, `/entries/${input.entryId}`)}`,
  ].join("\n");
  const subject =
    input.decision === "countersigned"
      ? `Countersigned: ${input.entryTitle}`
      : `Returned for changes: ${input.entryTitle}`;
  return { subject, text };
}
