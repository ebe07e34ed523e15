// Runs once when a server instance starts (Next.js instrumentation). Notification mails queued
// by actions are sent right after each commit; this timer retries the ones that failed and
// sends what a previous instance left behind.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { startOutboxTimer } = await import("@/lib/mail/outbox-timer");
  startOutboxTimer();
}
