import { createClient, type Client } from "@libsql/client";
import { E2E_DATABASE_URL } from "../../../playwright.config";

/** The browser tests' database, which Leeway's local SMTP server also writes its outbox into. */
export function openE2eDatabase(): Client {
  return createClient({ url: E2E_DATABASE_URL });
}

export interface OutboxMessage {
  id: number;
  to: string;
  subject: string;
  text: string;
}

/** The highest outbox id now, so a test can wait for messages that arrive after it. */
export async function lastOutboxId(db: Client): Promise<number> {
  const result = await db.execute("select coalesce(max(id), 0) as id from outbox");
  return Number(result.rows[0].id);
}

/** Messages the local SMTP server stored after `afterId`, oldest first. */
export async function outboxSince(db: Client, afterId: number): Promise<OutboxMessage[]> {
  const result = await db.execute({ sql: 'select id, "to", subject, text from outbox where id > ? order by id', args: [afterId] });
  return result.rows.map((row) => ({ id: Number(row.id), to: String(row.to), subject: String(row.subject), text: String(row.text) }));
}

/** Waits for a message to `to` stored after `afterId` (SMTP delivery is asynchronous to the page). */
export async function waitForMessage(db: Client, { to, afterId, timeoutMs = 15_000 }: { to: string; afterId: number; timeoutMs?: number }): Promise<OutboxMessage> {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    const found = (await outboxSince(db, afterId)).find((message) => message.to === to);
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`No message to ${to} reached the outbox within ${timeoutMs} ms.`);
}

/** The first link in a message's text. */
export function firstLink(message: OutboxMessage): URL {
  const match = message.text.match(/https?:\/\/\S+/);
  if (!match) throw new Error(`No link in the message "${message.subject}".`);
  return new URL(match[0]);
}
