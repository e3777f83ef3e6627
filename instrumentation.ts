export async function register() {
  // First, before any request: stamp each request with its TCP peer for clientIp().
  if (process.env.NEXT_RUNTIME === "nodejs") await import("./lib/http/record-peer-address").then((m) => m.recordPeerAddress());
  if (process.env.NEXT_RUNTIME === "nodejs") await import("./lib/inbound-mail/start-inbound-smtp").then((m) => m.startInboundSmtpOnce());
  if (process.env.NEXT_RUNTIME !== "nodejs" || process.env.JOBS_WORKER === "off") return;
  const { startWorker } = await import("./lib/jobs/start-worker");
  // Not awaited: when the database is down at boot the worker keeps trying in the background.
  void startWorker();
}
