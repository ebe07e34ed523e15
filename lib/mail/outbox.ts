import "server-only";
import type { Executor } from "@/db/client";
import {
  claimDueMails,
  insertOutboxMails,
  markMailFailed,
  markMailSent,
} from "@/db/queries/outbox";
import { getDb } from "@/lib/server/database";
import { sendMail } from "./transport";

export interface QueuedMail {
  labId: string | null;
  kind: string;
  to: string;
  subject: string;
  text: string;
}

/** After this many failed sends a mail waits for an admin's "retry now". */
const MAX_SEND_ATTEMPTS = 6;

/** 1 min, 2, 4, 8, 16: later attempts wait longer. */
function nextAttemptDelayMs(attempts: number): number {
  return 60_000 * 2 ** Math.max(0, attempts - 1);
}

/** Queues mails in the caller's transaction: they exist if and only if the action committed. */
export async function queueMails(tx: Executor, mails: QueuedMail[]): Promise<void> {
  await insertOutboxMails(tx, mails);
}

let tail: Promise<unknown> = Promise.resolve();

/**
 * Sends the mails that are due. Runs after an action commits and every half minute
 * (instrumentation.ts); a failure is recorded on the row and retried later, never thrown
 * into the action that queued the mail. Passes run one after another in this process, and
 * a pass asked for while one runs still runs afterwards, so a mail queued meanwhile is not
 * left for the next timer.
 */
export function drainOutbox(now?: Date): Promise<{ sent: number; failed: number }> {
  const pass = tail.then(() => sendDue(now ?? new Date()));
  tail = pass.catch(() => undefined);
  return pass;
}

async function sendDue(now: Date): Promise<{ sent: number; failed: number }> {
  let sent = 0;
  let failed = 0;
  await getDb().transaction(async (tx) => {
    for (const mail of await claimDueMails(tx, now, 20, MAX_SEND_ATTEMPTS)) {
      try {
        await sendMail({ to: mail.to, labId: mail.labId, subject: mail.subject, text: mail.text });
        await markMailSent(tx, mail.id);
        sent += 1;
      } catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        const next = new Date(now.getTime() + nextAttemptDelayMs(mail.attempts + 1));
        await markMailFailed(tx, mail.id, message.slice(0, 500), next);
        failed += 1;
      }
    }
  });
  return { sent, failed };
}

/** Fire and forget after a commit: the action has already succeeded whatever happens here. */
export function kickOutbox(): void {
  drainOutbox().catch((error: unknown) => {
    console.error("[ionleaf] mail outbox", error instanceof Error ? error.message : error);
  });
}
