// Runs once when the Next.js server starts (not during `next build`): start the job worker in
// this process. TRAINYARD_WORKER=0 leaves it off (an instance that only serves requests).
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs" || process.env.TRAINYARD_WORKER === "0") return;
  const { startWorkers } = await import("./lib/jobs/worker");
  startWorkers();
}
