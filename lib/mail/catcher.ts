import http from "node:http";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";

// A local fake SMTP server for development, the demo and tests: it accepts every message,
// keeps it in memory, and shows it over HTTP (an inbox page and a JSON list), so people and
// tests can read what Cavitas sent and follow its links. It never relays anything.

export type CaughtMessage = {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
};

export type MailCatcher = {
  smtpPort: number;
  httpPort: number;
  messages: CaughtMessage[];
  close: () => Promise<void>;
};

export async function startMailCatcher(opts: { host?: string; smtpPort: number; httpPort: number }): Promise<MailCatcher> {
  const host = opts.host ?? "127.0.0.1";
  const messages: CaughtMessage[] = [];
  let nextId = 1;

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    banner: "Cavitas local mail catcher",
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((mail) => {
          messages.push({
            id: nextId++,
            from: mail.from?.text ?? session.envelope.mailFrom?.toString() ?? "",
            to: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
            subject: mail.subject ?? "",
            text: mail.text ?? "",
            html: typeof mail.html === "string" ? mail.html : null,
            receivedAt: new Date().toISOString(),
          });
          callback();
        })
        .catch((e: Error) => callback(e));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(opts.smtpPort, host, () => resolve());
  });

  const web = http.createServer((req, res) => {
    const url = new URL(req.url ?? "/", `http://${host}`);
    if (url.pathname === "/messages" && req.method === "GET") {
      const to = url.searchParams.get("to")?.toLowerCase();
      const list = to ? messages.filter((m) => m.to.includes(to)) : messages;
      res.writeHead(200, { "content-type": "application/json" });
      return res.end(JSON.stringify({ messages: list }));
    }
    if (url.pathname === "/messages" && req.method === "DELETE") {
      messages.length = 0;
      res.writeHead(204);
      return res.end();
    }
    if (url.pathname === "/" && req.method === "GET") {
      res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
      return res.end(inboxPage(messages));
    }
    res.writeHead(404, { "content-type": "text/plain" });
    res.end("not found");
  });
  await new Promise<void>((resolve, reject) => {
    web.once("error", reject);
    web.listen(opts.httpPort, host, () => resolve());
  });

  const smtpAddress = (smtp as unknown as { server: { address(): { port: number } } }).server.address();
  const httpAddress = web.address() as { port: number };
  return {
    smtpPort: smtpAddress.port,
    httpPort: httpAddress.port,
    messages,
    close: () =>
      new Promise<void>((resolve) => {
        web.close(() => smtp.close(() => resolve()));
      }),
  };
}

const escape = (s: string) => s.replace(/[&<>"]/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;" })[c]!);

function inboxPage(messages: CaughtMessage[]): string {
  const items = [...messages]
    .reverse()
    .map((m) => {
      const linked = escape(m.text).replace(/(https?:\/\/[^\s<]+)/g, '<a href="$1">$1</a>');
      return `<article><h2>${escape(m.subject)}</h2><p class="meta">to ${escape(m.to.join(", "))} · ${escape(m.receivedAt)}</p><pre>${linked}</pre></article>`;
    })
    .join("");
  return `<!doctype html><meta charset="utf-8"><title>Local mail (Cavitas)</title>
<meta http-equiv="refresh" content="10">
<style>body{font-family:sans-serif;background:#f6f2e9;color:#1a2740;max-width:760px;margin:2rem auto;padding:0 1rem}
article{border-top:1px solid #d9cfbb;padding:1rem 0}h2{font-size:1rem;margin:0}.meta{color:#7c8598;font-size:.8rem}
pre{white-space:pre-wrap;font-family:inherit}a{color:#8a4520}</style>
<h1>Local mail catcher</h1><p>Messages Cavitas sent while running locally. Nothing here left this machine.</p>
${items || "<p>No messages yet.</p>"}`;
}
