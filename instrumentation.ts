/**
 * Runs once when a Leeway server starts (Next's instrumentation hook), however it is started —
 * `npm start`, scripts/start-app.mjs or a process manager. A production server refuses to run
 * while demo accounts exist (lib/auth/demo-safety.ts).
 */
export async function register() {
  // The check opens the database, so it runs in the Node.js runtime only; `next build` does not serve.
  if (process.env.NEXT_RUNTIME === "nodejs" && process.env.NEXT_PHASE !== "phase-production-build") {
    const { refuseProductionWithDemoAccounts } = await import("./lib/auth/demo-safety");
    await refuseProductionWithDemoAccounts();
  }
}
