import { sql } from "drizzle-orm";
import { db } from "@/db/client";

/** GET /api/health — a cheap check for test harnesses and load balancers: the database answers. */
export async function GET() {
  await db.run(sql`select 1`);
  return Response.json({ ok: true });
}
