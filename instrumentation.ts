/**
 * Runs once when a Leeway server starts (Next's instrumentation hook), however it is started —
 * `npm start`, scripts/start-app.mjs or a process manager. A production server refuses to run
 * while demo accounts exist.
 */
export async function register() {
  // The check needs the Node.js runtime (it opens the database); `next build` does not serve.
  if (process.env.NEXT_RUNTIME !== "nodejs" || process.env.NEXT_PHASE === "phase-production-build") return;
  const { demoAccountsBlockingProduction } = await import("./lib/auth/demo-safety");
  const reason = await demoAccountsBlockingProduction();
  if (reason) {
    console.error(reason);
    process.exit(1);
  }
}
