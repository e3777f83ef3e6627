import { createHash } from "node:crypto";
import type { Knex } from "knex";

// Knex's own query step (not the connection's): the replica pool wraps it to run a read again on the primary when
// the replica goes away mid-statement (lib/db/replica.ts).
type ClientQuery = (
  connection: unknown,
  query: { sql: string; bindings: unknown[]; options?: { name: string } },
) => Promise<{ response: { rows: unknown[] } }>;

/**
 * Named prepared statements are on unless DATABASE_PREPARED_STATEMENTS=off or DATABASE_POOL_MODE=transaction: a
 * pooler in transaction mode (PgBouncer before 1.21) hands each statement to any server connection, so a statement
 * prepared on one is unknown on the next.
 */
export const preparedStatementsEnabled = () =>
  process.env.DATABASE_POOL_MODE !== "transaction" && !/^(off|false|0|no)$/i.test(process.env.DATABASE_PREPARED_STATEMENTS ?? "");

// Text values and non-empty arrays of one kind (never numbers, whose parameter type depends on where they stand)
// that occur more than once in a statement (the vendor, a filter that is also a boost) are sent once.
function shareKey(value: unknown): string | undefined {
  if (typeof value === "string") return `s${value}`;
  if (!Array.isArray(value) || value.length === 0) return undefined;
  if (value.every((v) => typeof v === "string")) return `t${JSON.stringify(value)}`;
  if (value.every((v) => typeof v === "number")) return `n${JSON.stringify(value)}`;
  return undefined;
}

/** `?` placeholders as `$n` with repeated values bound once; undefined for text knex must read (`??`, `\?`). */
export function numberPlaceholders(sql: string, bindings: readonly unknown[]): { text: string; values: unknown[] } | undefined {
  if (sql.includes("??") || sql.includes("\\?")) return undefined;
  const values: unknown[] = [];
  const shared = new Map<string, number>();
  let i = 0;
  const text = sql.replace(/\?/g, () => {
    if (i >= bindings.length) throw new Error("More placeholders than bindings in a search statement.");
    const value = bindings[i++];
    const key = shareKey(value);
    let n = key === undefined ? undefined : shared.get(key);
    if (n === undefined) {
      values.push(value);
      n = values.length;
      if (key !== undefined) shared.set(key, n);
    }
    return `$${n}`;
  });
  if (i !== bindings.length) throw new Error("Fewer placeholders than bindings in a search statement.");
  return { text, values };
}

// Statement names by text: the shapes are few, so the hash is worked out once per shape (bounded all the same).
const names = new Map<string, string>();
function statementName(text: string): string {
  let name = names.get(text);
  if (name === undefined) {
    if (names.size >= 1000) names.clear();
    name = `sbk_${createHash("sha1").update(text).digest("hex").slice(0, 24)}`;
    names.set(text, name);
  }
  return name;
}

export type NativeStatement = { text: string; values: readonly unknown[] };

/** Runs `$n` text on a pooled connection: named (planned once per connection and shape) unless named statements are off. */
export async function runNative<T>(knex: Knex, { text, values }: NativeStatement): Promise<T[]> {
  const connection: unknown = await knex.client.acquireConnection();
  try {
    const name = preparedStatementsEnabled() ? statementName(text) : undefined;
    const query: ClientQuery = knex.client.query.bind(knex.client);
    const result = await query(connection, { sql: text, bindings: [...values], ...(name && { options: { name } }) });
    return result.response.rows as T[];
  } finally {
    await knex.client.releaseConnection(connection);
  }
}

/**
 * Runs a statement as a named prepared statement on the pooled connection, so PostgreSQL plans each
 * shape of the search statement once per connection instead of on every keystroke. The name is a
 * hash of the text: the shapes are few (which parts are present), the values are always parameters.
 * With named statements off, the same text runs as an unnamed statement (one round trip, any pooler).
 */
export async function preparedQuery<T>(knex: Knex, sql: string, bindings: readonly unknown[]): Promise<T[]> {
  const native = numberPlaceholders(sql, bindings);
  return native ? runNative<T>(knex, native) : ((await knex.raw(sql, bindings as Knex.ValueDict[])).rows as T[]);
}
