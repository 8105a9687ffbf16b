import "server-only";
import { desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { outbox } from "@/db/schema";

/** Messages shown per outbox page. */
export const OUTBOX_PAGE_SIZE = 200;

/** The newest messages the local SMTP server kept, without their raw source. */
export async function listOutboxMessages({ limit = OUTBOX_PAGE_SIZE }: { limit?: number } = {}) {
  return db
    .select({ id: outbox.id, receivedAt: outbox.receivedAt, from: outbox.from, to: outbox.to, subject: outbox.subject })
    .from(outbox)
    .orderBy(desc(outbox.id))
    .limit(limit);
}

export async function findOutboxMessage({ id }: { id: number }) {
  return db.query.outbox.findFirst({ where: eq(outbox.id, id) });
}
