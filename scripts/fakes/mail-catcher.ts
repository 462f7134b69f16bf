import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { createServer, type Server } from "node:http";
import path from "node:path";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

// A local SMTP server for development and tests: it accepts every message on loopback, keeps it
// in a folder (raw .eml and parsed .json) and lists it over a tiny HTTP endpoint on loopback.

export interface CaughtMessage {
  id: string;
  to: string[];
  from: string;
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
}

export interface MailCatcher {
  smtpPort: number;
  httpPort: number;
  dir: string;
  close: () => Promise<void>;
}

export function readCaught(dir: string): CaughtMessage[] {
  let files: string[] = [];
  try {
    files = readdirSync(dir).filter((f) => f.endsWith(".json"));
  } catch {
    return [];
  }
  return files.sort().map((f) => JSON.parse(readFileSync(path.join(dir, f), "utf8")) as CaughtMessage);
}

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export async function startMailCatcher({
  smtpPort = 0,
  httpPort = 0,
  dir,
}: {
  smtpPort?: number;
  httpPort?: number;
  dir: string;
}): Promise<MailCatcher> {
  mkdirSync(dir, { recursive: true });
  let counter = 0;
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    size: 20 * 1024 * 1024,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", async () => {
        try {
          const raw = Buffer.concat(chunks);
          const parsed = await simpleParser(raw);
          counter += 1;
          const id = `${Date.now()}-${process.pid}-${counter}`;
          const message: CaughtMessage = {
            id,
            to: session.envelope.rcptTo.map((r) => r.address),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : "",
            receivedAt: new Date().toISOString(),
          };
          writeFileSync(path.join(dir, `${id}.eml`), raw);
          writeFileSync(path.join(dir, `${id}.json`), JSON.stringify(message, null, 2));
          callback();
        } catch (error) {
          callback(error as Error);
        }
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(smtpPort, "127.0.0.1", () => resolve());
  });
  const http: Server = createServer((req, res) => {
    const messages = readCaught(dir);
    if (req.method === "DELETE" && req.url === "/messages") {
      for (const f of readdirSync(dir)) rmSync(path.join(dir, f), { force: true });
      res.writeHead(204).end();
    } else if (req.url === "/messages") {
      res.writeHead(200, { "content-type": "application/json" }).end(JSON.stringify(messages));
    } else {
      const rows = messages
        .reverse()
        .map(
          (m) =>
            `<article><h2>${escape(m.subject)}</h2><p>To ${escape(m.to.join(", "))} · ${escape(m.receivedAt)}</p><pre>${escape(m.text)}</pre></article><hr>`,
        )
        .join("\n");
      res
        .writeHead(200, { "content-type": "text/html; charset=utf-8" })
        .end(
          `<!doctype html><title>Caught mail</title><h1>Mail caught by the local SMTP server</h1>${rows || "<p>No mail yet.</p>"}`,
        );
    }
  });
  await new Promise<void>((resolve, reject) => {
    http.once("error", reject);
    http.listen(httpPort, "127.0.0.1", () => resolve());
  });
  const address = (s: { address(): unknown }) => (s.address() as { port: number }).port;
  return {
    smtpPort: address(smtp.server),
    httpPort: address(http),
    dir,
    close: async () => {
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
      await new Promise<void>((resolve) => http.close(() => resolve()));
    },
  };
}

// CLI: tsx scripts/fakes/mail-catcher.ts --smtp-port 2525 --http-port 8025 --dir .data/mail
if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(__filename)) {
  const arg = (name: string, fallback: string) => {
    const i = process.argv.indexOf(`--${name}`);
    return i > 0 ? (process.argv[i + 1] ?? fallback) : fallback;
  };
  startMailCatcher({
    smtpPort: Number(arg("smtp-port", "2525")),
    httpPort: Number(arg("http-port", "8025")),
    dir: path.resolve(arg("dir", ".data/mail")),
  }).then(
    (c) => {
      console.log(
        `mail catcher: SMTP 127.0.0.1:${c.smtpPort}, read mail at http://127.0.0.1:${c.httpPort}/ (kept in ${c.dir})`,
      );
      const stop = () => void c.close().then(() => process.exit(0));
      process.on("SIGTERM", stop);
      process.on("SIGINT", stop);
    },
    (error) => {
      console.error("mail catcher could not start:", error);
      process.exit(1);
    },
  );
}
