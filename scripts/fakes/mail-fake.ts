import { SMTPServer } from "smtp-server";
import { simpleParser, type AddressObject } from "mailparser";
import http from "node:http";
import { mkdirSync, readdirSync, readFileSync, writeFileSync, rmSync } from "node:fs";
import path from "node:path";
import { randomUUID } from "node:crypto";

// A loopback stand-in for a hosted mail service: an SMTP server that accepts
// everything and keeps each message as JSON, plus a small HTTP API the app's
// "sent mail" page and the tests read from.
export interface CapturedMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  headers: Record<string, string>;
}

export interface MailFake {
  smtpPort: number;
  apiPort: number;
  close: () => Promise<void>;
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => (v.address ?? "").toLowerCase())).filter(Boolean);
}

export function readMail(dir: string): CapturedMail[] {
  mkdirSync(dir, { recursive: true });
  return readdirSync(dir)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((f) => JSON.parse(readFileSync(path.join(dir, f), "utf8")) as CapturedMail);
}

export async function startMailFake(opts: { dir: string; smtpPort: number; apiPort: number }): Promise<MailFake> {
  mkdirSync(opts.dir, { recursive: true });
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const id = randomUUID();
          const headers: Record<string, string> = {};
          for (const [key, value] of parsed.headers) {
            if (typeof value === "string") headers[key] = value;
          }
          // mailparser folds every List-* header into one parsed "list" object; keep each as it was
          // sent (unfolded), so checks can read List-Unsubscribe and List-Unsubscribe-Post as text.
          for (const { key, line } of parsed.headerLines) {
            if (key.startsWith("list-")) headers[key] = line.slice(line.indexOf(":") + 1).replace(/\r?\n[ \t]+/g, " ").trim();
          }
          const mail: CapturedMail = {
            id,
            receivedAt: new Date().toISOString(),
            from: addresses(parsed.from).join(", "),
            to: addresses(parsed.to),
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : null,
            headers,
          };
          const name = `${Date.now().toString().padStart(15, "0")}-${id}.json`;
          writeFileSync(path.join(opts.dir, name), JSON.stringify(mail, null, 2));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(opts.smtpPort, "127.0.0.1", () => resolve());
  });

  const api = http.createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://127.0.0.1");
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(body));
    };
    if (req.method === "GET" && url.pathname === "/messages") {
      const to = url.searchParams.get("to")?.toLowerCase();
      const group = url.searchParams.get("group");
      const all = readMail(opts.dir).filter(
        (m) => (!to || m.to.includes(to)) && (!group || m.headers["x-cantrove-group"] === group),
      );
      return send(200, all.reverse());
    }
    const one = url.pathname.match(/^\/messages\/([\w-]+)$/);
    if (req.method === "GET" && one) {
      const found = readMail(opts.dir).find((m) => m.id === one[1]);
      return found ? send(200, found) : send(404, { error: "not found" });
    }
    if (req.method === "DELETE" && url.pathname === "/messages") {
      rmSync(opts.dir, { recursive: true, force: true });
      mkdirSync(opts.dir, { recursive: true });
      return send(200, { ok: true });
    }
    send(404, { error: "not found" });
  });
  await new Promise<void>((resolve, reject) => {
    api.once("error", reject);
    api.listen(opts.apiPort, "127.0.0.1", () => resolve());
  });

  return {
    smtpPort: opts.smtpPort,
    apiPort: opts.apiPort,
    close: async () => {
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
      await new Promise<void>((resolve) => api.close(() => resolve()));
    },
  };
}
