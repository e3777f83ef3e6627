// The scaled-out shape (npm run test:scale): two app processes behind HAProxy, PgBouncer in front of the
// primary, a streaming standby for Library and search reads. Every request goes over loopback.
import { execFile } from "node:child_process";
import { randomUUID } from "node:crypto";
import { promisify } from "node:util";
import knexFactory, { type Knex } from "knex";
import PgBoss from "pg-boss";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { assertLocalDatabase } from "../../support/local-db-guard";
import { DEMO_PASSWORD, MAILDEV_URL } from "../support/env";

const run = promisify(execFile);
const env = (name: string): string => {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set: run this through npm run test:scale`);
  return value;
};
const BASE = env("SCALE_BASE_URL");
const APP1 = env("SCALE_APP1_URL");
const APP2 = env("SCALE_APP2_URL");
const VENDOR = "northbeck";
const RUN = randomUUID().slice(0, 8);
const MAX_LAG_SECONDS = Number(process.env.DATABASE_REPLICA_MAX_LAG_SECONDS ?? 10);

let primary: Knex;
let standby: Knex;
let boss: PgBoss;
const tokens: Record<string, string> = {};

function cookiesFrom(response: Response): string {
  return response.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

async function signIn(base: string, email: string): Promise<string> {
  const csrf = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const response = await fetch(`${base}/api/auth/callback/password`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookiesFrom(csrf) },
    body: new URLSearchParams({ csrfToken, email, password: DEMO_PASSWORD, callbackUrl: base, json: "true" }),
  });
  const session = response.headers.getSetCookie().find((c) => c.startsWith("next-auth.session-token="));
  expect(session, `sign-in of ${email} set no session cookie (status ${response.status})`).toBeTruthy();
  return session!.split(";")[0];
}

async function createToken(email: string): Promise<string> {
  const { stdout } = await run(
    "node",
    [
      "--conditions=react-server",
      "--import",
      "tsx",
      "scripts/token.ts",
      "create",
      "--vendor",
      VENDOR,
      "--email",
      email,
      "--name",
      `scale ${RUN}`,
    ],
    {
      env: { ...process.env, DATABASE_URL: env("SCALE_PRIMARY_URL") },
    },
  );
  return stdout.trim();
}

const api = (path: string, init: RequestInit & { token?: string; cookie?: string } = {}) => {
  const headers = new Headers(init.headers);
  if (init.token) headers.set("authorization", `Bearer ${init.token}`);
  if (init.cookie) headers.set("cookie", init.cookie);
  if (init.body) headers.set("content-type", "application/json");
  return fetch(`${BASE}/api/v1/vendors/${VENDOR}${path}`, { ...init, headers });
};

async function until<T>(
  what: string,
  seconds: number,
  probe: () => Promise<T | undefined | false>,
): Promise<{ value: T; waitedMs: number }> {
  const started = Date.now();
  for (;;) {
    const value = await probe();
    if (value) return { value, waitedMs: Date.now() - started };
    if (Date.now() - started > seconds * 1000) throw new Error(`Timed out after ${seconds} s waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

async function mails(prefix: string): Promise<string[]> {
  const list = (await (await fetch(`${MAILDEV_URL}/api/email`)).json()) as { subject: string }[];
  return list.map((m) => m.subject).filter((s) => s.startsWith(prefix));
}

beforeAll(async () => {
  primary = knexFactory({ client: "pg", connection: env("SCALE_PRIMARY_URL"), pool: { min: 0, max: 2 } });
  standby = knexFactory({ client: "pg", connection: env("SCALE_STANDBY_ADMIN_URL"), pool: { min: 0, max: 1 } });
  for (const url of [env("SCALE_PRIMARY_URL"), env("SCALE_STANDBY_ADMIN_URL")]) assertLocalDatabase(url);
  const emails = ["eng1@northbeck.test", "eng2@northbeck.test", "maker@example.test", "hobby@example.test", "shop@example.test"];
  const secrets = await Promise.all(emails.map(createToken));
  emails.forEach((email, i) => (tokens[email] = secrets[i]));
  boss = new PgBoss({ connectionString: env("SCALE_PRIMARY_URL"), max: 2, supervise: false, schedule: false, migrate: false });
  await boss.start();
  // A schedule every minute, fired by the app processes' pg-boss (both run one); checked in the last test.
  await boss.schedule("mail.send", "* * * * *", { to: "ops@example.test", subject: `scale-cron-${RUN}`, text: "tick" }, { tz: "UTC" });
});

afterAll(async () => {
  await boss?.unschedule("mail.send").catch(() => undefined);
  await boss?.stop({ graceful: false, wait: true });
  await primary?.destroy();
  await standby?.destroy();
});

describe("two app processes behind HAProxy", () => {
  it("serves through HAProxy with the replica in use", async () => {
    const health = (await (await fetch(`${BASE}/api/health`)).json()) as {
      ok: boolean;
      replica: { configured: boolean; usable: boolean; lagSeconds: number };
    };
    expect(health.ok).toBe(true);
    expect(health.replica).toMatchObject({ configured: true, usable: true });
    expect(health.replica.lagSeconds).toBeLessThanOrEqual(MAX_LAG_SECONDS);
  });

  it("a session made on one process works on the other", async () => {
    const cookie = await signIn(APP1, "support1@northbeck.test");
    const other = await fetch(`${APP2}/api/v1/vendors/${VENDOR}/tickets`, { headers: { cookie } });
    expect(other.status).toBe(200);
    const anonymous = await fetch(`${APP2}/api/v1/vendors/${VENDOR}/tickets`);
    expect(anonymous.status).not.toBe(200);
  });

  it("a rate limit holds across both processes", async () => {
    const body = JSON.stringify({
      units: "metric",
      operation: {
        kind: "slotting",
        diameter: { value: 6, unit: "mm" },
        flutes: 2,
        spindleSpeed: { value: 18000, unit: "rpm" },
        feed: { value: 1500, unit: "mm/min" },
        axialDepth: { value: 3, unit: "mm" },
        radialDepth: { value: 6, unit: "mm" },
      },
      material: {
        cuttingSpeedWindow: { min: 100, max: 400, unit: "m/min" },
        minChipLoad: { value: 0.03, unit: "mm/tooth" },
        specificCuttingForce: { value: 100, unit: "N/mm²" },
      },
      referenceMachine: { rigidity: 0.8 },
      machine: {
        spindleSpeed: { min: 8000, max: 24000, unit: "rpm" },
        maxFeed: { value: 5000, unit: "mm/min" },
        spindlePower: { value: 1.5, unit: "kW" },
        rigidity: 0.5,
      },
    });
    const statuses: number[] = [];
    // 120 a minute per client address; round robin spreads the 130 calls over both processes.
    for (let i = 0; i < 130; i++) {
      const response = await fetch(`${BASE}/api/v1/calculate`, { method: "POST", headers: { "content-type": "application/json" }, body });
      statuses.push(response.status);
      await response.arrayBuffer();
    }
    expect(statuses.filter((s) => s === 200)).toHaveLength(120);
    expect(statuses.filter((s) => s === 429)).toHaveLength(10);
  });

  it("a ticket created through one process appears in the Desk served by the other", async () => {
    const customer = await signIn(APP1, "shop@example.test");
    const subject = `Scale ${RUN}: chatter on the 6 mm cutter`;
    const created = await fetch(`${APP1}/api/v1/vendors/${VENDOR}/tickets`, {
      method: "POST",
      // As the site's own page sends it (people browse through HAProxy): a change made with the session cookie
      // must carry the app's public origin.
      headers: { cookie: customer, "content-type": "application/json", origin: new URL(BASE).origin },
      body: JSON.stringify({ subject, body: "It chatters at full depth.", idempotencyKey: `scale-desk-${RUN}` }),
    });
    expect(created.status).toBe(201);
    const staff = await signIn(APP1, "support1@northbeck.test");
    const desk = await fetch(`${APP2}/${VENDOR}/desk`, { headers: { cookie: staff } });
    expect(desk.status).toBe(200);
    expect(await desk.text()).toContain(subject);
  });

  it("a published sheet reaches the Library read from the replica within the lag bound, and its author at once", async () => {
    const sheet = await primary("sheet_versions as v")
      .join("sheets as s", "s.id", "v.sheet_id")
      .join("vendors as vd", "vd.id", "v.vendor_id")
      .where({ "vd.slug": VENDOR, "v.state": "published" })
      .whereNotExists((q) =>
        q.select(primary.raw("1")).from("sheet_versions as d").whereRaw("d.sheet_id = s.id and d.state in ('draft', 'in_review')"),
      )
      .orderBy("s.slug")
      .first<{ slug: string; number: number; source: string }>("s.slug", "v.number", "v.source");
    expect(sheet).toBeTruthy();
    const { slug, number, source } = sheet!;
    const author = tokens["eng1@northbeck.test"];
    const current = async (cookie?: string) =>
      ((await (await api(`/sheets/${slug}`, { cookie })).json()) as { currentNumber: number }).currentNumber;
    expect(await current()).toBe(number);

    // Hold the standby's replay: what the anonymous reader sees now can only come from the replica.
    await primary.raw("select txid_current()");
    const lsn = (await primary.raw("select pg_current_wal_lsn()::text as lsn")).rows[0].lsn as string;
    await until(
      "the standby to catch up",
      20,
      async () => (await standby.raw("select pg_last_wal_replay_lsn() >= ?::pg_lsn as ok", [lsn])).rows[0].ok,
    );
    await standby.raw("select pg_wal_replay_pause()");
    let authorCookie = "";
    try {
      expect((await api(`/sheets/${slug}/draft`, { method: "PUT", token: author, body: JSON.stringify({ source }) })).status).toBe(201);
      expect(
        (
          await api(`/sheets/${slug}/draft/submit`, {
            method: "POST",
            token: author,
            body: JSON.stringify({ changeNote: `Scale run ${RUN}` }),
          })
        ).status,
      ).toBeLessThan(300);
      expect((await api(`/sheets/${slug}/draft/approve`, { method: "POST", token: tokens["eng2@northbeck.test"] })).status).toBeLessThan(
        300,
      );
      const published = await api(`/sheets/${slug}/draft/publish`, { method: "POST", token: author });
      expect(published.status).toBeLessThan(300);
      authorCookie = cookiesFrom(published);
      expect(authorCookie).toContain("sb-read-primary=1");
      expect(await current(), "a reader without the pin reads the paused replica").toBe(number);
      expect(await current(authorCookie), "the author reads the primary right after publishing").toBe(number + 1);
    } finally {
      await standby.raw("select pg_wal_replay_resume()");
    }
    const { waitedMs } = await until("the new version on the replica", MAX_LAG_SECONDS, async () => (await current()) === number + 1);
    console.log(`[scale] the published version reached readers of the replica ${waitedMs} ms after replay resumed`);
  });

  it("200 queued jobs each run once with two workers", async () => {
    const prefix = `scale-job-${RUN}-`;
    await boss.insert(
      Array.from({ length: 200 }, (_, i) => ({
        name: "mail.send",
        data: { to: "ops@example.test", subject: `${prefix}${i}`, text: "probe" },
      })),
    );
    // Each worker takes one job a second per queue (batches of one, so a failed mail never resends others).
    await until("200 mails", 200, async () => (await mails(prefix)).length >= 200);
    await new Promise((r) => setTimeout(r, 3000));
    const subjects = await mails(prefix);
    expect(subjects).toHaveLength(200);
    expect(new Set(subjects).size).toBe(200);
  }, 240_000);

  it("stopping one app process mid-load costs no acknowledged write", async () => {
    const customers = ["maker@example.test", "hobby@example.test", "shop@example.test"];
    const acknowledged = new Map<string, string>();
    let failures = 0;
    let sent = 0;
    const create = async (token: string, key: string) => {
      for (let attempt = 0; attempt < 8; attempt++) {
        try {
          const response = await api("/tickets", {
            method: "POST",
            token,
            body: JSON.stringify({ subject: `Load ${key}`, body: "Under load.", idempotencyKey: key }),
          });
          if (response.status === 201 || response.status === 200) {
            acknowledged.set(key, ((await response.json()) as { ticket: { id: string } }).ticket.id);
            return;
          }
          await response.arrayBuffer();
        } catch {
          // The connection broke: not acknowledged; the same key makes the retry safe.
        }
        failures++;
        await new Promise((r) => setTimeout(r, 300));
      }
    };
    const load = customers.map(async (email) => {
      for (let i = 0; i < 20; i++) {
        sent++;
        await create(tokens[email], `scale-${RUN}-${email.split("@")[0]}-${i}`);
      }
    });
    await until("a few writes before the stop", 30, async () => sent >= 15);
    process.kill(Number(env("SCALE_APP2_PID")), "SIGTERM");
    await Promise.all(load);
    console.log(`[scale] ${acknowledged.size} writes acknowledged, ${failures} attempts failed while app2 stopped`);
    expect(acknowledged.size).toBe(60);
    const rows = await primary("tickets")
      .whereIn("idempotency_key", [...acknowledged.keys()])
      .select("id", "idempotency_key");
    expect(rows).toHaveLength(acknowledged.size);
    for (const row of rows) expect(acknowledged.get(row.idempotency_key)).toBe(row.id);
  });

  it("stopping the replica sends reads to the primary without errors", async () => {
    const reads = [`/api/v1/vendors/${VENDOR}/sheets`, `/api/v1/vendors/${VENDOR}/search?q=aluminium`, `/${VENDOR}/library`];
    const statuses: number[] = [];
    let stopping = true;
    const loop = (async () => {
      while (stopping) {
        for (const path of reads) {
          const response = await fetch(`${BASE}${path}`);
          statuses.push(response.status);
          await response.arrayBuffer();
        }
      }
    })();
    await new Promise((r) => setTimeout(r, 1000));
    await run(
      "runuser",
      ["-u", "postgres", "--", "/usr/lib/postgresql/15/bin/pg_ctl", "-D", env("SCALE_STANDBY_DATA"), "-m", "fast", "-w", "stop"],
      { cwd: "/" },
    );
    await new Promise((r) => setTimeout(r, 4000));
    stopping = false;
    await loop;
    expect(statuses.length).toBeGreaterThan(reads.length * 2);
    expect(statuses.filter((s) => s !== 200)).toEqual([]);
    const health = (await (await fetch(`${BASE}/api/health`)).json()) as { replica: { usable: boolean } };
    expect(health.replica.usable).toBe(false);
  });

  it("a schedule fires once a minute, not once per process", async () => {
    const subject = `scale-cron-${RUN}`;
    const { waitedMs } = await until("the first scheduled job", 150, async () => {
      const { rows } = await primary.raw("select count(*)::int as n from pgboss.job where name = 'mail.send' and data->>'subject' = ?", [
        subject,
      ]);
      return rows[0].n > 0;
    });
    await new Promise((r) => setTimeout(r, 5000));
    const { rows } = await primary.raw(
      "select date_trunc('minute', created_on) as minute, count(*)::int as n from pgboss.job where name = 'mail.send' and data->>'subject' = ? group by 1",
      [subject],
    );
    console.log(`[scale] first scheduled job after ${waitedMs} ms; jobs per minute: ${rows.map((r: { n: number }) => r.n).join(", ")}`);
    for (const row of rows as { n: number }[]) expect(row.n).toBe(1);
  });
});
