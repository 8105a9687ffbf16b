import { sql } from "drizzle-orm";
import { connect } from "@/db/connect";
import { getEnv, type Env } from "@/lib/env";

/**
 * Demo accounts have published passwords, so they exist only in demo mode. With
 * LEEWAY_MODE=production this returns the reason the server must not start while any remain
 * (or when the database cannot be read), and null when it may. Uses its own connection: it runs
 * from instrumentation.ts before the app's modules are loaded.
 */
export async function demoAccountsBlockingProduction(
  env: Pick<Env, "LEEWAY_MODE" | "DATABASE_URL" | "DATABASE_AUTH_TOKEN"> = getEnv(),
): Promise<string | null> {
  if (env.LEEWAY_MODE !== "production") return null;
  const { db, client } = connect(env.DATABASE_URL, env.DATABASE_AUTH_TOKEN);
  try {
    const result = await db.run(sql`select email from users where is_demo = 1 order by email`);
    if (result.rows.length === 0) return null;
    const emails = result.rows.map((row) => String(row.email)).join(", ");
    return `Leeway will not start in production mode while demo accounts exist (${emails}). Their passwords are published in the README. Start production on a database without the demo seed (docs/people.md, "Demo safety"), or run with LEEWAY_MODE=demo.`;
  } catch (error) {
    return `Leeway could not check ${env.DATABASE_URL} for demo accounts (${error instanceof Error ? error.message : String(error)}); run the migrations first.`;
  } finally {
    client.close();
  }
}

/** Ends the process with the reason when production must not start (called from instrumentation.ts). */
export async function refuseProductionWithDemoAccounts(): Promise<void> {
  const reason = await demoAccountsBlockingProduction();
  if (reason) {
    console.error(reason);
    process.exit(1);
  }
}
