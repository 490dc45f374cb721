import { randomUUID } from "node:crypto";
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import http from "node:http";
import path from "node:path";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";
import type { CapturedMail } from "../lib/dev/captured-mail";

export interface MailFakeOptions {
  smtpPort: number;
  apiPort: number;
  directory: string;
}

const MAX_KEPT = 500;

function listen(
  server: Pick<http.Server, "once" | "removeListener" | "listen">,
  port: number,
  name: string,
): Promise<void> {
  return new Promise((resolve, reject) => {
    const fail = (error: NodeJS.ErrnoException) =>
      reject(
        error.code === "EADDRINUSE"
          ? new Error(`Port ${port} on 127.0.0.1 is already taken, so the mail fake's ${name} cannot start.`)
          : error,
      );
    server.once("error", fail);
    server.listen(port, "127.0.0.1", () => {
      server.removeListener("error", fail);
      resolve();
    });
  });
}

/**
 * Captures every message the app sends: an SMTP server (smtp-server, mailparser) that stores each message as JSON
 * in an ignored folder, and a small read-only HTTP API on 127.0.0.1 for the /dev/mail pages and the tests.
 */
export async function startMailFake({ smtpPort, apiPort, directory }: MailFakeOptions) {
  const dir = path.resolve(directory);
  mkdirSync(dir, { recursive: true });

  const files = () =>
    readdirSync(dir)
      .filter((name) => name.endsWith(".json"))
      .sort()
      .reverse();
  const read = (file: string) => JSON.parse(readFileSync(path.join(dir, file), "utf8")) as CapturedMail;

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    size: 25 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const addresses = (value: typeof parsed.to) =>
            (Array.isArray(value) ? value : value ? [value] : []).flatMap((a) => a.value.map((v) => v.address ?? ""));
          const receivedAt = new Date().toISOString();
          const mail: CapturedMail = {
            id: `${receivedAt.replace(/[-:.TZ]/g, "")}-${randomUUID().slice(0, 8)}`,
            receivedAt,
            from: parsed.from?.text ?? "",
            to: addresses(parsed.to),
            subject: parsed.subject ?? "(no subject)",
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : null,
          };
          writeFileSync(path.join(dir, `${mail.id}.json`), JSON.stringify(mail));
          for (const old of files().slice(MAX_KEPT)) rmSync(path.join(dir, old));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });

  const api = http.createServer((request, response) => {
    const url = new URL(request.url ?? "/", "http://127.0.0.1");
    const send = (status: number, body: unknown) => {
      response.writeHead(status, { "content-type": "application/json" });
      response.end(JSON.stringify(body));
    };
    if (request.method === "DELETE" && url.pathname === "/messages") {
      for (const file of files()) rmSync(path.join(dir, file));
      return send(200, { deleted: true });
    }
    if (request.method !== "GET") return send(405, { error: "read-only" });
    if (url.pathname === "/messages") {
      const to = url.searchParams.get("to")?.toLowerCase();
      const list = files()
        .map(read)
        .filter((mail) => !to || mail.to.some((address) => address.toLowerCase() === to))
        .map(({ html: _html, ...summary }) => summary);
      return send(200, { messages: list });
    }
    const match = /^\/messages\/([\w-]+)$/.exec(url.pathname);
    if (match) {
      try {
        return send(200, read(`${match[1]}.json`));
      } catch {
        return send(404, { error: "not_found" });
      }
    }
    return send(404, { error: "not_found" });
  });

  await listen(smtp as unknown as http.Server, smtpPort, "SMTP server");
  await listen(api, apiPort, "message API");

  return {
    smtpUrl: `smtp://127.0.0.1:${smtpPort}`,
    apiUrl: `http://127.0.0.1:${apiPort}`,
    close: () =>
      Promise.all([
        new Promise<void>((resolve) => smtp.close(() => resolve())),
        new Promise<void>((resolve) => api.close(() => resolve())),
      ]).then(() => undefined),
  };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const fake = await startMailFake({
    smtpPort: Number(process.env.SMTP_PORT ?? 1025),
    apiPort: Number(new URL(process.env.MAIL_FAKE_API_URL ?? "http://127.0.0.1:1080").port),
    directory: process.env.MAIL_FAKE_DIR ?? ".data/mail",
  });
  console.log(`Mail fake: SMTP on ${fake.smtpUrl}, messages at ${fake.apiUrl}/messages`);
  process.on("SIGINT", () => void fake.close().then(() => process.exit(0)));
}
