import path from "node:path";
import { Worker } from "node:worker_threads";

export type DeadlineResult = { status: "done"; output: string } | { status: "threw"; error: string } | { status: "timed out" };

type Reply = { id: number; ok: true; output: string } | { id: number; ok: false; error: string };

/**
 * Calls `exportName` of `entry` (a .ts/.tsx module, loaded through tsx, returning a string) on a worker thread with a deadline per call.
 * The worker gets the main thread's stack size (about 1 MB), so a stack overflow shows up as it would in the server.
 * A call past its deadline ends the worker; the next call starts a fresh one.
 */
export class DeadlineRunner {
  private worker: Promise<Worker> | null = null;
  private next = 0;

  constructor(
    private readonly entry: string,
    private readonly exportName: string,
  ) {}

  private start(): Promise<Worker> {
    const worker = new Worker(path.resolve(import.meta.dirname, "deadline-worker.mjs"), {
      workerData: { entry: path.resolve(this.entry), exportName: this.exportName },
      resourceLimits: { stackSizeMb: 1 },
    });
    return new Promise((resolve, reject) => {
      worker.once("message", () => resolve(worker));
      worker.once("error", reject);
    });
  }

  async run(input: string, deadlineMs: number): Promise<DeadlineResult> {
    this.worker ??= this.start();
    const worker = await this.worker;
    const id = this.next++;
    return new Promise((resolve) => {
      const onMessage = (reply: Reply) => {
        if (reply.id !== id) return;
        clearTimeout(timer);
        worker.off("message", onMessage);
        resolve(reply.ok ? { status: "done", output: String(reply.output) } : { status: "threw", error: reply.error });
      };
      const timer = setTimeout(() => {
        worker.off("message", onMessage);
        this.worker = null;
        void worker.terminate();
        resolve({ status: "timed out" });
      }, deadlineMs);
      worker.on("message", onMessage);
      worker.postMessage({ id, input });
    });
  }

  async close(): Promise<void> {
    const worker = await this.worker;
    this.worker = null;
    await worker?.terminate();
  }
}
