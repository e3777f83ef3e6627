// Benchmark: how fast the job worker drains a backlog of queued mail (what is left after a relay outage, or a batch
// alert to many customers), against the same messages sent straight to the same relay with nodemailer, with the
// worker's pool size and as many senders (the bare baseline). Blocks in turn (bare, worker, worker, bare, …) in a throwaway database, against a
// local SMTP sink on 127.0.0.1. Figures are printed as ratios measured in this run, never judged in a test.
// Run: npm run bench:mail -- [--mails 300] [--blocks 4]
import type { AddressInfo } from "node:net";
import nodemailer from "nodemailer";
import { SMTPServer } from "smtp-server";

import { arg, percentile } from "./lib/bench-args";
import { withBenchDatabase } from "./lib/bench-database";

const MAILS = arg("mails", 300, 5_000);
const BLOCKS = arg("blocks", 4, 20);

type Block = { latencies: number[]; wallMs: number };

/** An SMTP sink that accepts everything and notes when each message (numbered in its subject) arrived. */
async function startSink(onAccepted: (n: number) => void) {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    disableReverseLookup: true,
    onData(stream, _session, callback) {
      let head = "";
      stream.on("data", (chunk: Buffer) => {
        if (head.length < 4_000) head += chunk.toString("utf8");
      });
      stream.on("end", () => {
        const n = /Subject: bench (\d+)/.exec(head);
        if (n) onAccepted(Number(n[1]));
        callback();
      });
    },
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  return { server, port: (server.server.address() as AddressInfo).port };
}

const message = (n: number) => ({ to: `reader${n % 50}@bench.test`, subject: `bench ${n}`, text: `Message ${n}.\n`.repeat(40) });

function summary(name: string, blocks: Block[]) {
  const latencies = blocks.flatMap((b) => b.latencies).sort((a, b) => a - b);
  const wallMs = blocks.reduce((s, b) => s + b.wallMs, 0);
  return {
    name,
    count: latencies.length,
    p50: percentile(latencies, 50),
    p95: percentile(latencies, 95),
    perSecond: (latencies.length / wallMs) * 1000,
  };
}

await withBenchDatabase({ prefix: "swarfbook_bench_mail", poolMax: 10 }, async (url) => {
  const accepted = new Map<number, number>();
  const { server, port } = await startSink((n) => accepted.set(n, performance.now()));
  // The app's modules read their configuration when first imported.
  Object.assign(process.env, { DATABASE_URL: url, SMTP_HOST: "127.0.0.1", SMTP_PORT: String(port), JOBS_WORKER: "on" });
  const { db } = await import("../lib/db/knex");
  const { enqueueMail } = await import("../lib/mail/enqueue-mail");
  const { mailTransportOptions } = await import("../lib/mail/transport-options");
  const { startWorker } = await import("../lib/jobs/start-worker");
  const { getBoss } = await import("../lib/jobs/boss");
  await startWorker();
  const { MAIL_SEND_CONCURRENCY } = await import("../lib/mail/send-concurrency");
  const lanes = MAIL_SEND_CONCURRENCY;
  // The bare baseline sends the way the worker's transport does: pooled, as many connections and senders as it has.
  const direct = nodemailer.createTransport({ ...mailTransportOptions(process.env), pool: true, maxConnections: lanes });

  let next = 0;
  async function bare(): Promise<Block> {
    const latencies: number[] = [];
    const started = performance.now();
    let sent = 0;
    await Promise.all(
      Array.from({ length: lanes }, async () => {
        while (sent < MAILS) {
          sent++;
          const t = performance.now();
          await direct.sendMail({ from: "bench@bench.test", ...message(next++) });
          latencies.push(performance.now() - t);
        }
      }),
    );
    return { latencies, wallMs: performance.now() - started };
  }
  async function worker(): Promise<Block> {
    const first = next;
    next += MAILS;
    await db.transaction(async (trx) => {
      for (let n = first; n < first + MAILS; n++) await enqueueMail(trx, message(n));
    });
    const committed = performance.now();
    const deadline = committed + 600_000;
    while ([...Array(MAILS).keys()].some((i) => !accepted.has(first + i))) {
      if (performance.now() > deadline) throw new Error("The worker did not drain the backlog within 10 minutes.");
      await new Promise((resolve) => setTimeout(resolve, 10));
    }
    const times = Array.from({ length: MAILS }, (_, i) => (accepted.get(first + i) ?? Infinity) - committed);
    return { latencies: times, wallMs: Math.max(...times) };
  }

  const bareBlocks: Block[] = [];
  const workerBlocks: Block[] = [];
  for (let round = 0; round < BLOCKS; round++) {
    if (round % 2 === 0) {
      bareBlocks.push(await bare());
      workerBlocks.push(await worker());
    } else {
      workerBlocks.push(await worker());
      bareBlocks.push(await bare());
    }
    console.log(`round ${round + 1}/${BLOCKS} done`);
  }
  const b = summary("bare nodemailer", bareBlocks);
  const w = summary("job worker (backlog)", workerBlocks);
  console.log(`\n${MAILS} mails per block, ${BLOCKS} blocks of each, ${lanes} at once`);
  for (const s of [w, b])
    console.log(
      `  ${s.name.padEnd(24)} ${String(s.count).padStart(6)} sent  p50 ${s.p50.toFixed(1).padStart(8)} ms  p95 ${s.p95.toFixed(1).padStart(8)} ms  ${s.perSecond.toFixed(0).padStart(6)}/s`,
    );
  console.log("  (the worker's times run from the backlog's commit to each mail's arrival, so they include the wait in the queue)");
  console.log(`mail drain/bare throughput ratio: ${(w.perSecond / b.perSecond).toFixed(2)}`);
  await (await getBoss()).stop({ graceful: false, wait: true });
  direct.close();
  server.close();
  await db.destroy();
});
