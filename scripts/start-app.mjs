// Starts the built app (and, outside production, Leeway's local SMTP server) as child processes
// in one process group, so stopping this process stops them all. A child that fails stops the
// others and its exit code becomes this process's (a production start refused for demo accounts
// exits 1 — see instrumentation.ts).
import { spawn } from "node:child_process";

const portIndex = process.argv.indexOf("--port");
const port = portIndex > 0 ? process.argv[portIndex + 1] : process.env.PORT ?? "3000";

const children = [spawn(process.execPath, ["node_modules/next/dist/bin/next", "start", "-p", port], { stdio: "inherit" })];
if (process.env.LEEWAY_MODE !== "production") {
  children.push(spawn(process.execPath, ["node_modules/tsx/dist/cli.mjs", "scripts/fake-smtp.ts"], { stdio: "inherit" }));
}

function stop(code = 0) {
  for (const child of children) child.kill("SIGTERM");
  process.exit(code);
}
process.on("SIGINT", () => stop());
process.on("SIGTERM", () => stop());
for (const child of children) child.on("exit", (code) => code && code !== 0 && stop(code));
