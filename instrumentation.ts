// Runs once when the server starts (Node.js runtime only): see lib/server-start.ts.
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs" && process.env.NEXT_PHASE !== "phase-production-build") {
    const { prepareServer } = await import("./lib/server-start");
    await prepareServer();
  }
}
