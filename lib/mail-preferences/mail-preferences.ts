import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";

import { MAIL_KINDS, type MailKind } from "./mail-kinds";

type Who = { vendorId: string; userId: string };
type Conn = Knex | Knex.Transaction;

// One row per person, vendor and kind; no row means the mail is wanted. Every query carries vendor and user.

/** Whether this person wants this kind of mail from this vendor. Senders pass their transaction when they have one. */
export async function wantsMail(trx: Conn | undefined, { vendorId, userId, kind }: Who & { kind: MailKind }): Promise<boolean> {
  const row = await (trx ?? db)("mail_preferences").where({ vendor_id: vendorId, user_id: userId, kind }).first("enabled");
  return row ? Boolean(row.enabled) : true;
}

/** Of these people, the ones who want this kind of mail from this vendor (one query, order kept). */
export async function filterWantsMail<T extends { id: string }>(
  trx: Conn | undefined,
  { vendorId, kind, people }: { vendorId: string; kind: MailKind; people: T[] },
): Promise<T[]> {
  if (!people.length) return people;
  const off = new Set<string>(
    await (trx ?? db)("mail_preferences")
      .where({ vendor_id: vendorId, kind, enabled: false })
      .whereIn(
        "user_id",
        people.map((p) => p.id),
      )
      .pluck("user_id"),
  );
  return people.filter((p) => !off.has(p.id));
}

export async function setMailPreference(
  { vendorId, userId, kind, enabled }: Who & { kind: MailKind; enabled: boolean },
  trx: Conn = db,
): Promise<void> {
  await trx("mail_preferences")
    .insert({ vendor_id: vendorId, user_id: userId, kind, enabled })
    .onConflict(["vendor_id", "user_id", "kind"])
    .merge({ enabled, updated_at: db.fn.now() });
}

/** Every kind with this person's choice (on unless turned off). */
export async function listMailPreferences({ vendorId, userId }: Who): Promise<Record<MailKind, boolean>> {
  const rows: { kind: MailKind; enabled: boolean }[] = await db("mail_preferences")
    .where({ vendor_id: vendorId, user_id: userId })
    .select("kind", "enabled");
  const out = Object.fromEntries(MAIL_KINDS.map((k) => [k, true])) as Record<MailKind, boolean>;
  for (const row of rows) out[row.kind] = Boolean(row.enabled);
  return out;
}

/** Set several kinds at once (the preferences page), in one transaction. */
export async function saveMailPreferences({
  vendorId,
  userId,
  choices,
}: Who & { choices: Partial<Record<MailKind, boolean>> }): Promise<void> {
  await db.transaction(async (trx) => {
    for (const kind of MAIL_KINDS) {
      const enabled = choices[kind];
      if (enabled !== undefined) await setMailPreference({ vendorId, userId, kind, enabled }, trx);
    }
  });
}

/**
 * A WHERE condition for sender queries that join people: keeps rows whose person has not turned this kind off.
 * `userColumn` and `vendorColumn` name the query's columns for the person and the vendor.
 */
export function wantsMailSql(kind: MailKind, userColumn: string, vendorColumn: string) {
  return (q: Knex.QueryBuilder) =>
    q.whereNotExists((sub) =>
      sub
        .select(db.raw("1"))
        .from("mail_preferences as mpref")
        .where("mpref.user_id", db.ref(userColumn))
        .andWhere("mpref.vendor_id", db.ref(vendorColumn))
        .where({ "mpref.kind": kind, "mpref.enabled": false }),
    );
}
