// A local SMTP sink for development, the demo and the tests: it accepts every message on 127.0.0.1,
// keeps it in memory, and lists it as JSON over HTTP (GET /messages, DELETE /messages).
import { createServer } from "node:http";
import { fileURLToPath } from "node:url";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

const LINK = /https?:\/\/[^\s<>"')]+/g;

/** Starts the sink; resolves with its ports and a stop function. Port 0 picks a free port. */
export async function startMailSink({ host = "127.0.0.1", smtpPort = 2525, httpPort = 2526, quiet = false } = {}) {
  const messages = [];
  let next = 1;

  const smtp = new SMTPServer({
    authOptional: true,
    // The built-in STARTTLS certificate has expired; the sink speaks plain SMTP on loopback only.
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const text = parsed.text ?? "";
          const to = [parsed.to].flat().filter(Boolean).flatMap((a) => a.value.map((v) => v.address));
          const message = {
            id: String(next++),
            from: parsed.from?.value[0]?.address ?? session.envelope.mailFrom?.address ?? "",
            to,
            subject: parsed.subject ?? "",
            text,
            html: typeof parsed.html === "string" ? parsed.html : "",
            links: [...new Set(text.match(LINK) ?? [])],
            receivedAt: new Date().toISOString(),
          };
          messages.unshift(message);
          if (messages.length > 500) messages.pop();
          if (!quiet) console.log(`[mail] to ${to.join(", ")}: ${message.subject}`);
          callback();
        })
        .catch((error) => callback(error));
    },
  });

  const http = createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://sink");
    if (url.pathname === "/messages" && req.method === "GET") {
      const to = url.searchParams.get("to")?.toLowerCase();
      const list = to ? messages.filter((m) => m.to.some((a) => a.toLowerCase() === to)) : messages;
      res.writeHead(200, { "content-type": "application/json" });
      res.end(JSON.stringify({ messages: list }));
      return;
    }
    if (url.pathname === "/messages" && req.method === "DELETE") {
      messages.length = 0;
      res.writeHead(204).end();
      return;
    }
    res.writeHead(404, { "content-type": "application/json" });
    res.end(JSON.stringify({ error: { code: "not_found", message: "Only /messages is served here." } }));
  });

  await new Promise((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(smtpPort, host, resolve);
  });
  await new Promise((resolve, reject) => {
    http.once("error", reject);
    http.listen(httpPort, host, resolve);
  });
  const ports = { smtpPort: smtp.server.address().port, httpPort: http.address().port };
  return {
    host,
    ...ports,
    url: `http://${host}:${ports.httpPort}`,
    stop: () => Promise.all([new Promise((r) => smtp.close(r)), new Promise((r) => http.close(r))]),
  };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const sink = await startMailSink({
    smtpPort: Number(process.env.MAIL_SINK_SMTP_PORT ?? 2525),
    httpPort: Number(process.env.MAIL_SINK_HTTP_PORT ?? 2526),
  });
  console.log(`mail sink: SMTP on ${sink.host}:${sink.smtpPort}, messages at ${sink.url}/messages`);
}
