import { createHash } from "node:crypto";

import type { Knex } from "knex";

type PgConnection = { query: (config: { name?: string; text: string; values: readonly unknown[] }) => Promise<{ rows: unknown[] }> };

/**
 * Named prepared statements are on unless DATABASE_PREPARED_STATEMENTS=off or DATABASE_POOL_MODE=transaction: a
 * pooler in transaction mode (PgBouncer before 1.21) hands each statement to any server connection, so a statement
 * prepared on one is unknown on the next.
 */
export const preparedStatementsEnabled = () =>
  process.env.DATABASE_POOL_MODE !== "transaction" && !/^(off|false|0|no)$/i.test(process.env.DATABASE_PREPARED_STATEMENTS ?? "");

/**
 * Runs a statement as a named prepared statement on the pooled connection, so PostgreSQL plans each
 * shape of the search statement once per connection instead of on every keystroke. The name is a
 * hash of the text: the shapes are few (which parts are present), the values are always parameters.
 */
export async function preparedQuery<T>(knex: Knex, sql: string, bindings: readonly unknown[]): Promise<T[]> {
  if (!preparedStatementsEnabled()) return (await knex.raw(sql, bindings as Knex.ValueDict[])).rows as T[];
  const native = knex.raw(sql, bindings as Knex.ValueDict[]).toSQL().toNative();
  const name = `sbk_${createHash("sha1").update(native.sql).digest("hex").slice(0, 24)}`;
  const connection = (await knex.client.acquireConnection()) as PgConnection;
  try {
    return (await connection.query({ name, text: native.sql, values: native.bindings })).rows as T[];
  } finally {
    await knex.client.releaseConnection(connection);
  }
}
