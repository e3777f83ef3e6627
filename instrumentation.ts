export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") await import("./lib/inbound-mail/start-inbound-smtp").then((m) => m.startInboundSmtpOnce());
  if (process.env.NEXT_RUNTIME !== "nodejs" || process.env.JOBS_WORKER === "off") return;
  const { startWorker } = await import("./lib/jobs/start-worker");
  // Not awaited: when the database is down at boot the worker keeps trying in the background.
  void startWorker();
}
