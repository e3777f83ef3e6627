import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

import { faultMailDevPort, faultPgEnv, faultSmtpPort, root } from "./fault-env";

/** Stop or start the fault tests' own PostgreSQL (never the shared test cluster). */
export function faultPg(cmd: "stop" | "start"): void {
  execFileSync("bash", [path.join(root, "scripts/pg.sh"), cmd], { cwd: root, env: { ...process.env, ...faultPgEnv() }, stdio: "pipe" });
}

export type MailDev = { stop(): Promise<void>; mails(): Promise<{ subject: string; to: { address: string }[]; text: string }[]> };

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** MailDev on the fault ports; stop() ends exactly this process. */
export async function startMailDev(): Promise<MailDev> {
  const web = `http://127.0.0.1:${faultMailDevPort()}`;
  // An earlier file's MailDev may still be letting go of the ports.
  for (
    let i = 0;
    i < 40 &&
    (await fetch(`${web}/api/healthz`)
      .then(() => true)
      .catch(() => false));
    i++
  )
    await sleep(250);
  const child: ChildProcess = spawn(
    path.join(root, "node_modules/.bin/maildev"),
    [
      "--ip",
      "127.0.0.1",
      "--smtp",
      String(faultSmtpPort()),
      "--web",
      String(faultMailDevPort()),
      "--mail-directory",
      mkdtempSync(path.join(tmpdir(), "fault-maildev-")),
    ],
    { stdio: "ignore" },
  );
  for (let i = 0; i < 60; i++) {
    const up = await fetch(`${web}/api/healthz`)
      .then((r) => r.ok)
      .catch(() => false);
    if (up) break;
    await sleep(250);
  }
  return {
    async stop() {
      if (child.exitCode !== null) return;
      const exited = new Promise((resolve) => child.once("exit", resolve));
      child.kill("SIGTERM");
      await Promise.race([exited, sleep(5_000)]);
    },
    async mails() {
      return (await fetch(`${web}/api/email`)).json();
    },
  };
}

/** Poll until `check` is true or the time is up; returns whether it became true. */
export async function waitFor(
  check: () => Promise<boolean>,
  { timeoutMs, intervalMs = 500 }: { timeoutMs: number; intervalMs?: number },
): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check().catch(() => false)) return true;
    await sleep(intervalMs);
  }
  return false;
}

export const report = (name: string, figures: Record<string, unknown>) => console.log(`[fault] ${name}: ${JSON.stringify(figures)}`);

/** Each fault test starts with an empty queue (its own cluster): an earlier file's leftovers would blur its figures. */
export async function emptyQueue(): Promise<void> {
  const { db } = await import("@/lib/db/knex");
  await db.raw("delete from pgboss.job where name not like '\\_\\_%'").catch((error: { code?: string }) => {
    if (error.code !== "42P01") throw error;
  });
}
