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
