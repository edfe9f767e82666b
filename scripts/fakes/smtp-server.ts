import http from "node:http";
import { SMTPServer } from "smtp-server";

/**
 * A local stand-in for an SMTP relay, for development and tests. It keeps what it
 * receives in memory and answers a small HTTP control API:
 *   GET /messages · DELETE /messages · POST /mode {"mode":"accept"|"tempfail"|"refuse"}
 * "tempfail" answers 451 to every message; "refuse" closes the SMTP port (an outage).
 */
export type CapturedMessage = { id: number; from: string; to: string[]; raw: string; receivedAt: string };
export type FakeSmtpMode = "accept" | "tempfail" | "refuse";

export async function startFakeSmtp(opts: { smtpPort: number; controlPort: number; host?: string }) {
  const host = opts.host ?? "127.0.0.1";
  const messages: CapturedMessage[] = [];
  let mode: FakeSmtpMode = "accept";
  let nextId = 1;

  const makeSmtp = () =>
    new SMTPServer({
      authOptional: true,
      disabledCommands: ["STARTTLS", "AUTH"],
      logger: false,
      size: 25 * 1024 * 1024,
      onData(stream, session, callback) {
        const chunks: Buffer[] = [];
        stream.on("data", (c: Buffer) => chunks.push(c));
        stream.on("end", () => {
          if (mode === "tempfail") {
            const error = new Error("Try again later") as Error & { responseCode: number };
            error.responseCode = 451;
            return callback(error);
          }
          messages.push({
            id: nextId++,
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
            to: session.envelope.rcptTo.map((r) => r.address),
            raw: Buffer.concat(chunks).toString("utf8"),
            receivedAt: new Date().toISOString(),
          });
          callback();
        });
      },
    });

  let smtp: SMTPServer | null = makeSmtp();
  await new Promise<void>((resolve, reject) => {
    smtp!.once("error", reject);
    smtp!.listen(opts.smtpPort, host, () => resolve());
  });

  const setMode = async (next: FakeSmtpMode) => {
    if (next === "refuse" && smtp) {
      const closing = smtp;
      smtp = null;
      await new Promise<void>((resolve) => closing.close(() => resolve()));
    }
    if (next !== "refuse" && !smtp) {
      smtp = makeSmtp();
      await new Promise<void>((resolve) => smtp!.listen(opts.smtpPort, host, () => resolve()));
    }
    mode = next;
  };

  const control = http.createServer(async (req, res) => {
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(body));
    };
    if (req.url === "/messages" && req.method === "GET") return send(200, { mode, messages });
    if (req.url === "/messages" && req.method === "DELETE") {
      messages.length = 0;
      return send(200, { cleared: true });
    }
    if (req.url === "/mode" && req.method === "POST") {
      let text = "";
      for await (const chunk of req) text += chunk;
      try {
        const wanted = JSON.parse(text).mode as FakeSmtpMode;
        if (!["accept", "tempfail", "refuse"].includes(wanted)) return send(400, { error: "unknown mode" });
        await setMode(wanted);
        return send(200, { mode });
      } catch {
        return send(400, { error: "bad JSON" });
      }
    }
    send(404, { error: "not found" });
  });
  await new Promise<void>((resolve, reject) => {
    control.once("error", reject);
    control.listen(opts.controlPort, host, () => resolve());
  });

  return {
    messages,
    setMode,
    async close() {
      await setMode("refuse");
      await new Promise<void>((resolve) => control.close(() => resolve()));
    },
  };
}
