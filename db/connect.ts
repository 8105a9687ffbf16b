import { mkdirSync } from "node:fs";
import path from "node:path";
import { createClient, type Client } from "@libsql/client";
import { drizzle, type LibSQLDatabase } from "drizzle-orm/libsql";
import * as schema from "./schema";

export type Database = LibSQLDatabase<typeof schema>;

/**
 * Opens a libSQL client for a `file:` path (embedded), `:memory:`, or a libSQL server URL.
 * libSQL does not create the folder of an embedded file, so that is done here.
 */
export function connect(url: string, authToken?: string): { client: Client; db: Database } {
  if (url.startsWith("file:")) {
    mkdirSync(path.dirname(url.slice("file:".length)), { recursive: true });
  }
  const client = createClient({ url, authToken });
  return { client, db: drizzle(client, { schema }) };
}
