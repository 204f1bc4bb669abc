// @ts-nocheck
// A local stand-in for the shop's SMTP server: accepts mail on 127.0.0.1, keeps it in memory
// (and, when given a file, on disk so a restart keeps the inbox), and shows it as JSON over HTTP
// so the admin's mailbox page and the tests can read what was "sent".
import fs from "node:fs";
import http from "node:http";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

export type CapturedMail = {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  date: string;
};

export type MailFake = { smtpUrl: string; inboxUrl: string; stop: () => Promise<void> };

export async function startMailFake(opts: { smtpPort: number; httpPort: number; file?: string }): Promise<MailFake> {
  let inbox: CapturedMail[] = [];
  if (opts.file && fs.existsSync(opts.file)) {
    try {
      inbox = JSON.parse(fs.readFileSync(opts.file, "utf8"));
    } catch {
      inbox = [];
    }
  }
  const save = () => opts.file && fs.writeFileSync(opts.file, JSON.stringify(inbox.slice(-500)));
  let nextId = inbox.reduce((m, x) => Math.max(m, x.id), 0) + 1;

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const to = session.envelope.rcptTo.map((r) => r.address);
          inbox.push({
            id: nextId++,
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
            to,
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : "",
            date: new Date().toISOString(),
          });
          save();
          callback();
        })
        .catch((err) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(opts.smtpPort, "127.0.0.1", () => resolve());
  });

  const web = http.createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://127.0.0.1");
    if (url.pathname === "/messages" && req.method === "GET") {
      const to = url.searchParams.get("to");
      const list = to ? inbox.filter((m) => m.to.some((a) => a.toLowerCase() === to.toLowerCase())) : inbox;
      res.writeHead(200, { "content-type": "application/json" });
      res.end(JSON.stringify([...list].reverse()));
    } else if (url.pathname === "/messages" && req.method === "DELETE") {
      inbox = [];
      save();
      res.writeHead(204).end();
    } else {
      res.writeHead(404).end();
    }
  });
  await new Promise<void>((resolve, reject) => {
    web.once("error", reject);
    web.listen(opts.httpPort, "127.0.0.1", () => resolve());
  });

  return {
    smtpUrl: `smtp://127.0.0.1:${opts.smtpPort}`,
    inboxUrl: `http://127.0.0.1:${opts.httpPort}`,
    stop: () =>
      new Promise<void>((resolve) => {
        web.close();
        smtp.close(() => resolve());
      }),
  };
}
