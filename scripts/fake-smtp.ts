import { appendFile, mkdir, readFile, writeFile } from "node:fs/promises";
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { simpleParser, type AddressObject, type ParsedMail } from "mailparser";
import { SMTPServer, type SMTPServerSession } from "smtp-server";
import type { CapturedMail } from "../lib/mail/list-captured-mail";

/**
 * Local stand-in for a mail provider: accepts every message on 127.0.0.1, keeps it in memory and
 * in a JSON-lines file (a restart keeps the inbox), and lists it over a small HTTP API for the
 * development mail page and the tests. Greylists addresses that start with greylist- once. Never exposed beyond loopback, so no auth and no TLS.
 */
export type FakeSmtpOptions = { host: string; smtpPort: number; apiPort: number; directory: string };
export type RunningService = { close: () => Promise<void> };

const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

export async function startFakeSmtp(options: FakeSmtpOptions): Promise<RunningService> {
  const store = await openStore(path.join(options.directory, "messages.jsonl"));
  const greylisted = new Set<string>();
  const smtp = new SMTPServer({
    banner: "Panelpoint fake SMTP",
    authOptional: true,
    // Accept any credentials: production settings with SMTP_USER must still work against the fake.
    allowInsecureAuth: true,
    onAuth: (auth, _session, callback) => callback(null, { user: auth.username ?? "fake" }),
    disabledCommands: ["STARTTLS"],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    // Greylisting, as many real servers do: the first attempt for a greylist-… address is refused
    // with a temporary 451, so the tests can watch the mail queue retry a transient failure.
    onRcptTo: (address, _session, callback) => {
      const to = address.address.toLowerCase();
      if (to.startsWith("greylist-") && !greylisted.has(to)) {
        greylisted.add(to);
        return callback(Object.assign(new Error("Greylisted: please try again later"), { responseCode: 451 }));
      }
      callback();
    },
    onData: (stream, session, callback) => {
      // Answer 250 only once stored, so a resolved sendMail() is already listed.
      simpleParser(stream)
        .then((mail) => store.add(toCaptured(mail, session)))
        .then(() => callback(), (error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
    },
  });
  await listen((done) => smtp.listen(options.smtpPort, options.host, done), (fail) => smtp.once("error", fail));
  // Once listening, errors concern one connection: log them, keep serving.
  smtp.on("error", (error: Error) => console.error(`fake SMTP: ${error.message}`));

  const api = createServer((req, res) => {
    handleApi(store, req, res).catch((error: unknown) => send(res, 500, { error: String(error) }));
  });
  try {
    await listen((done) => api.listen(options.apiPort, options.host, done), (fail) => api.once("error", fail));
  } catch (error: unknown) {
    await new Promise<void>((resolve) => smtp.close(() => resolve()));
    throw error;
  }

  return {
    close: async () => {
      await Promise.all([
        new Promise<void>((resolve) => smtp.close(() => resolve())),
        new Promise<void>((resolve) => api.close(() => resolve())),
      ]);
      await store.flushed();
    },
  };
}

type Store = {
  list: () => CapturedMail[];
  add: (mail: CapturedMail) => Promise<void>;
  clear: () => Promise<void>;
  flushed: () => Promise<void>;
};

async function openStore(file: string): Promise<Store> {
  await mkdir(path.dirname(file), { recursive: true });
  const messages: CapturedMail[] = await loadLines(file);
  // Writes are chained so lines land in the file in the order the messages arrived.
  let writes: Promise<void> = Promise.resolve();
  const enqueue = (write: () => Promise<void>): Promise<void> => {
    writes = writes.then(write);
    return writes;
  };
  return {
    list: () => [...messages].reverse(),
    add: (mail) => {
      messages.push(mail);
      return enqueue(() => appendFile(file, `${JSON.stringify(mail)}\n`));
    },
    clear: () => {
      messages.length = 0;
      return enqueue(() => writeFile(file, ""));
    },
    flushed: () => writes,
  };
}

async function loadLines(file: string): Promise<CapturedMail[]> {
  let content: string;
  try {
    content = await readFile(file, "utf8");
  } catch (error: unknown) {
    if (isErrno(error, "ENOENT")) return [];
    throw error;
  }
  const out: CapturedMail[] = [];
  for (const line of content.split("\n")) {
    if (!line.trim()) continue;
    try {
      const value: unknown = JSON.parse(line);
      if (isCaptured(value)) out.push(value);
    } catch (error: unknown) {
      // A line cut short by a crash must not cost the rest of the inbox.
      console.error(`fake SMTP: skipping an unreadable line in ${file}: ${String(error)}`);
    }
  }
  return out;
}

async function handleApi(store: Store, req: IncomingMessage, res: ServerResponse): Promise<void> {
  const url = new URL(req.url ?? "/", "http://localhost");
  const parts = url.pathname.split("/").filter(Boolean);
  if (parts[0] !== "messages" || parts.length > 2) return send(res, 404, { error: "not found" });
  if (req.method === "GET" && parts.length === 1) return send(res, 200, store.list());
  if (req.method === "GET") {
    const found = store.list().find((m) => m.id === parts[1]);
    return found ? send(res, 200, found) : send(res, 404, { error: "no such message" });
  }
  if (req.method === "DELETE" && parts.length === 1) {
    await store.clear();
    res.writeHead(204).end();
    return;
  }
  send(res, 405, { error: "method not allowed" });
}

function send(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { "content-type": "application/json; charset=utf-8", "cache-control": "no-store" });
  res.end(JSON.stringify(body));
}

function toCaptured(mail: ParsedMail, session: SMTPServerSession): CapturedMail {
  // The envelope says who actually received it (Cc and Bcc included); headers are only a claim.
  const envelopeTo = session.envelope.rcptTo.map((r) => r.address);
  const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
  return {
    id: randomUUID(),
    from: mail.from?.text ?? envelopeFrom,
    to: envelopeTo.length > 0 ? envelopeTo : addresses(mail.to),
    subject: mail.subject ?? "",
    text: mail.text ?? "",
    html: typeof mail.html === "string" ? mail.html : null,
    date: (mail.date ?? new Date()).toISOString(),
    attachments: mail.attachments.map((a) => ({ filename: a.filename ?? "", contentType: a.contentType, size: a.size })),
  };
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = field === undefined ? [] : Array.isArray(field) ? field : [field];
  return list.flatMap((a) => a.value.map((v) => v.address ?? "")).filter(Boolean);
}

function isCaptured(value: unknown): value is CapturedMail {
  return typeof value === "object" && value !== null && "id" in value && typeof value.id === "string";
}

function isErrno(error: unknown, code: string): boolean {
  return error instanceof Error && "code" in error && error.code === code;
}

/** Resolves once listening; rejects on the first error (EADDRINUSE above all). */
function listen(start: (done: () => void) => void, onError: (fail: (error: Error) => void) => void): Promise<void> {
  return new Promise<void>((resolve, reject) => {
    onError(reject);
    start(() => resolve());
  });
}
