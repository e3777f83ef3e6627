import "server-only";

import PgBoss from "pg-boss";

import { directDatabaseUrl } from "@/lib/db/config";

const globalForBoss = globalThis as unknown as { swarfbookBoss?: Promise<PgBoss> };

// One pg-boss instance per process; it holds its own small pool, directly on the primary (never through PgBouncer).
export function getBoss(): Promise<PgBoss> {
  globalForBoss.swarfbookBoss ??= (async () => {
    const boss = new PgBoss({ connectionString: directDatabaseUrl(), max: 4 });
    boss.on("error", (error: unknown) => console.error("[jobs]", error));
    await boss.start();
    return boss;
  })();
  return globalForBoss.swarfbookBoss;
}
