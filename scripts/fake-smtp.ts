// Leeway's local SMTP server (development, tests, demo): listens on 127.0.0.1:$SMTP_PORT and keeps
// every message in the outbox table of $DATABASE_URL. Started by scripts/start-app.mjs outside production.
import { connect } from "../db/connect";
import { createFakeSmtpServer } from "../lib/mail/fake-smtp-server";

const databaseUrl = process.env.DATABASE_URL ?? "file:./data/leeway.db";
const port = Number(process.env.SMTP_PORT ?? 2525);

const { db, client } = connect(databaseUrl, process.env.DATABASE_AUTH_TOKEN);
const server = createFakeSmtpServer({ db });

server.on("error", (error) => {
  console.error(`Leeway's local SMTP server failed: ${error.message}`);
  process.exit(1);
});
server.listen(port, "127.0.0.1", () => {
  console.log(`Leeway's local SMTP server is listening on 127.0.0.1:${port}; messages go to the outbox of ${databaseUrl}`);
});

function stop() {
  server.close(() => {
    client.close();
    process.exit(0);
  });
}
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
