/**
 * The mail catcher: a local SMTP server (smtp-server) that accepts every message on
 * loopback and keeps it, so the demo and the tests can read invitation and countersignature
 * mails without a real relay. Messages are kept in memory and in a JSON file, and served
 * read-only over a small HTTP API on loopback:
 *   GET /health · GET /messages · GET /messages/:id · DELETE /messages
 *
 * Usage: tsx scripts/mail-catcher.ts --smtp-port 2525 --http-port 2580 --store FILE
 */
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import { createServer } from "node:http";
import { existsSync, readFileSync, writeFileSync, renameSync } from "node:fs";
import { randomUUID } from "node:crypto";

interface CaughtMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
  labId: string | null;
}

function arg(name: string, fallback: string): string {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 && process.argv[i + 1] ? process.argv[i + 1] : fallback;
}

const smtpPort = Number(arg("smtp-port", "2525"));
const httpPort = Number(arg("http-port", "2580"));
const storeFile = arg("store", "");
const MAX_MESSAGES = 500;

let messages: CaughtMessage[] = [];
if (storeFile && existsSync(storeFile)) {
  try {
    messages = JSON.parse(readFileSync(storeFile, "utf8")) as CaughtMessage[];
  } catch {
    messages = []; // a damaged store is not worth refusing to start for
  }
}

function persist() {
  if (!storeFile) return;
  const tmp = `${storeFile}.tmp`;
  writeFileSync(tmp, JSON.stringify(messages));
  renameSync(tmp, storeFile); // atomic: a crash never leaves half a file
}

function headerText(value: unknown): string | null {
  return typeof value === "string" && value ? value : null;
}

function addressList(value: unknown): string[] {
  if (!value) return [];
  const list = Array.isArray(value) ? value : [value];
  return list
    .flatMap((a: { value?: { address?: string }[] }) => (a.value ?? []).map((v) => v.address ?? ""))
    .filter(Boolean);
}

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  size: 10 * 1024 * 1024,
  logger: false,
  onData(stream, _session, callback) {
    simpleParser(stream)
      .then((parsed) => {
        messages.unshift({
          id: randomUUID(),
          from: addressList(parsed.from)[0] ?? "",
          to: addressList(parsed.to),
          subject: parsed.subject ?? "",
          // Which lab the mail concerns (set by lib/mail/transport.ts): the app shows an
          // admin only their own lab's messages.
          labId: headerText(parsed.headers.get("x-ionleaf-lab")),
          text: parsed.text ?? "",
          html: typeof parsed.html === "string" ? parsed.html : null,
          receivedAt: new Date().toISOString(),
        });
        messages = messages.slice(0, MAX_MESSAGES);
        persist();
        callback();
      })
      .catch((error: Error) => callback(error));
  },
});

// A client that hangs up mid-conversation (a process that exits while its mail is being sent)
// is the client's problem: the catcher logs it and keeps serving everyone else.
smtp.on("error", (error) => console.error("mail catcher: SMTP connection error:", error.message));

const http = createServer((req, res) => {
  const send = (status: number, body: unknown) => {
    res.writeHead(status, { "content-type": "application/json" });
    res.end(JSON.stringify(body));
  };
  const url = new URL(req.url ?? "/", "http://localhost");
  if (url.pathname === "/health") return send(200, { ok: true, count: messages.length });
  if (url.pathname === "/messages" && req.method === "GET") return send(200, messages);
  if (url.pathname === "/messages" && req.method === "DELETE") {
    messages = [];
    persist();
    return send(200, { ok: true });
  }
  const match = /^\/messages\/([0-9a-f-]+)$/.exec(url.pathname);
  if (match && req.method === "GET") {
    const found = messages.find((m) => m.id === match[1]);
    return found ? send(200, found) : send(404, { error: "not_found" });
  }
  send(404, { error: "not_found" });
});

http.on("clientError", (_error, socket) => socket.destroy());

smtp.listen(smtpPort, "127.0.0.1", () => {
  http.listen(httpPort, "127.0.0.1", () => {
    console.log(
      `mail catcher: SMTP 127.0.0.1:${smtpPort}, messages at http://127.0.0.1:${httpPort}/messages`,
    );
  });
});

function shutdown() {
  smtp.close(() => undefined);
  http.close(() => process.exit(0));
  setTimeout(() => process.exit(0), 2000).unref();
}
process.on("SIGTERM", shutdown);
process.on("SIGINT", shutdown);
