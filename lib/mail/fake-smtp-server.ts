import { simpleParser } from "mailparser";
import { SMTPServer, type SMTPServerAddress } from "smtp-server";
import type { Database } from "@/db/connect";
import { outbox } from "@/db/schema";

/** Largest message the local server accepts; Leeway's own messages are a few kilobytes. */
const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

function addressList(addresses: SMTPServerAddress[]): string {
  return addresses.map((address) => address.address).join(", ");
}

/**
 * Leeway's local SMTP server for development, tests and the demo: it accepts every message from
 * the loopback interface and keeps it in the `outbox` table instead of delivering it, so the
 * outbox page and the browser tests can read it. Plain SMTP only (no STARTTLS) — it must be bound
 * to 127.0.0.1 by its caller.
 */
export function createFakeSmtpServer({ db }: { db: Database }): SMTPServer {
  return new SMTPServer({
    banner: "Leeway local SMTP server: messages are kept in the outbox, never delivered",
    disabledCommands: ["STARTTLS"],
    authOptional: true,
    // A deployment's SMTP_USER/SMTP_PASSWORD may be set while testing against this server; any pair is accepted.
    allowInsecureAuth: true,
    onAuth(auth, _session, callback) {
      callback(null, { user: auth.username ?? "leeway" });
    },
    size: MAX_MESSAGE_BYTES,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("error", callback);
      stream.on("end", async () => {
        if (stream.sizeExceeded) {
          callback(Object.assign(new Error(`Message larger than ${MAX_MESSAGE_BYTES} bytes`), { responseCode: 552 }));
          return;
        }
        try {
          const raw = Buffer.concat(chunks).toString("utf8");
          const parsed = await simpleParser(raw);
          const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
          await db.insert(outbox).values({
            from: parsed.from?.text || envelopeFrom,
            to: addressList(session.envelope.rcptTo),
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            raw,
          });
          callback();
        } catch (error) {
          console.error("Leeway's local SMTP server could not store a message:", error);
          callback(Object.assign(new Error("Message could not be stored"), { responseCode: 451 }));
        }
      });
    },
  });
}
