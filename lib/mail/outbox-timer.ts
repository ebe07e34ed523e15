import "server-only";
import { drainOutbox } from "./outbox";

const INTERVAL_MS = 30_000;
let timer: ReturnType<typeof setInterval> | null = null;

/** Drains the mail outbox every half minute for the life of this server process. */
export function startOutboxTimer(): void {
  if (timer) return;
  timer = setInterval(() => {
    drainOutbox().catch((error: unknown) => {
      console.error("[ionleaf] mail outbox", error instanceof Error ? error.message : error);
    });
  }, INTERVAL_MS);
  timer.unref();
}
