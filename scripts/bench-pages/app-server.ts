// The production build of the app for scripts/bench-pages.ts: built into its own folder, started on loopback
// against the benchmark's throwaway database, stopped at the end.
import { spawn, type ChildProcess } from "node:child_process";
import { openSync } from "node:fs";
import { mkdir } from "node:fs/promises";
import path from "node:path";

const root = path.join(import.meta.dirname, "../..");
export const BENCH_DIST_DIR = ".next-bench";

function run(command: string, args: string[], env: NodeJS.ProcessEnv, log: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const out = openSync(log, "w");
    const child = spawn(command, args, { cwd: root, env, stdio: ["ignore", out, out] });
    child.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`${command} ${args.join(" ")} failed (${code}); see ${log}`))));
  });
}

export async function buildApp(logDir: string) {
  await mkdir(logDir, { recursive: true });
  const t = performance.now();
  await run(
    path.join(root, "node_modules/.bin/next"),
    ["build"],
    { ...process.env, NEXT_DIST_DIR: BENCH_DIST_DIR },
    path.join(logDir, "build.log"),
  );
  console.log(`built into ${BENCH_DIST_DIR} in ${Math.round((performance.now() - t) / 1000)} s`);
}

export type AppServer = { baseUrl: string; secret: string; stop: () => Promise<void> };

export async function startApp({ databaseUrl, port, logDir }: { databaseUrl: string; port: number; logDir: string }): Promise<AppServer> {
  await mkdir(logDir, { recursive: true });
  const baseUrl = `http://127.0.0.1:${port}`;
  const secret = `bench-secret-${Date.now()}-not-for-production`;
  const out = openSync(path.join(logDir, "app.log"), "w");
  const child: ChildProcess = spawn(path.join(root, "node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: "production",
      NEXT_DIST_DIR: BENCH_DIST_DIR,
      DATABASE_URL: databaseUrl,
      DATABASE_POOL_MAX: process.env.DATABASE_POOL_MAX ?? "10",
      NEXTAUTH_URL: baseUrl,
      NEXTAUTH_SECRET: secret,
      JOBS_WORKER: "off",
      STORAGE_DIR: path.join(logDir, "uploads"),
      // Every request comes from one address; the limiter still runs (and costs what it costs) but never refuses.
      API_RATE_LIMIT_MULTIPLIER: "1000000",
    },
    stdio: ["ignore", out, out],
  });
  const stop = () =>
    new Promise<void>((resolve) => {
      if (child.exitCode !== null) return resolve();
      child.once("exit", () => resolve());
      child.kill("SIGTERM");
      setTimeout(() => child.kill("SIGKILL"), 5_000).unref();
    });
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the app exited (${child.exitCode}); see ${logDir}/app.log`);
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      await stop();
      throw new Error("the app did not start within 60 s");
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  return { baseUrl, secret, stop };
}
