import { migrate } from "drizzle-orm/libsql/migrator";
import { connect } from "./connect";

/** Applies the committed drizzle-kit migrations in db/migrations to DATABASE_URL. */
async function main() {
  const url = process.env.DATABASE_URL ?? "file:./data/leeway.db";
  const { db, client } = connect(url, process.env.DATABASE_AUTH_TOKEN);
  await migrate(db, { migrationsFolder: "db/migrations" });
  client.close();
  console.log(`migrations applied to ${url}`);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
