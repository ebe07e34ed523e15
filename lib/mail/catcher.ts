import "server-only";
import { z } from "@/lib/validation/zod";
import { getEnv } from "@/lib/env";

const caughtMessageSchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  receivedAt: z.string(),
  labId: z.string().nullable().optional(),
});
export type CaughtMessage = z.infer<typeof caughtMessageSchema>;

/** True when mail goes to the local mail catcher (demo and tests), so its inbox can be shown. */
export function mailCatcherConfigured(): boolean {
  return Boolean(getEnv().MAIL_CATCHER_URL);
}

/**
 * The caught messages that concern one lab. The catcher holds every lab's mail (invitation
 * links among them), so an admin sees only the messages tagged with their own lab; untagged
 * ones (none are sent today) are shown to nobody.
 */
export async function listCaughtMessages(labId: string): Promise<CaughtMessage[]> {
  const base = getEnv().MAIL_CATCHER_URL;
  if (!base) return [];
  const response = await fetch(new URL("/messages", base), { cache: "no-store" });
  if (!response.ok) throw new Error(`mail catcher answered ${response.status}`);
  const all = z.array(caughtMessageSchema).parse(await response.json());
  return all.filter((m) => m.labId === labId);
}
