import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { getEnv } from "@/lib/env";

/** A plain-text message; Leeway's e-mails carry links and figures, nothing that needs HTML. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
}

let transporter: Transporter | undefined;

/**
 * One SMTP client for the process, configured from SMTP_HOST/PORT/USER/PASSWORD. Port 465 speaks
 * TLS from the first byte; other ports upgrade with STARTTLS when the server offers it.
 */
function getTransporter(): Transporter {
  if (transporter) return transporter;
  const env = getEnv();
  transporter = nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_PORT === 465,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? "" } : undefined,
    // A mail server that does not answer must not hold a planner's request for minutes.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return transporter;
}

/** Sends one message from SMTP_FROM. Rejects with the SMTP client's error when the server refuses it. */
export async function sendMail(message: MailMessage): Promise<void> {
  await getTransporter().sendMail({ from: getEnv().SMTP_FROM, ...message });
}

/** What happened to each message of a batch, so the page can say who was not reached. */
export interface DeliveryReport {
  sent: string[];
  failed: { to: string; reason: string }[];
}

/**
 * Sends messages one by one (one per recipient, so no one sees the others' addresses) and reports
 * failures instead of throwing: the change that caused the mail is already committed.
 */
export async function sendEach(messages: MailMessage[]): Promise<DeliveryReport> {
  const report: DeliveryReport = { sent: [], failed: [] };
  for (const message of messages) {
    try {
      await sendMail(message);
      report.sent.push(message.to);
    } catch (error) {
      console.error(`Leeway could not send mail to ${message.to}:`, error);
      report.failed.push({ to: message.to, reason: error instanceof Error ? error.message : String(error) });
    }
  }
  return report;
}
