import type { Knex } from "knex";

/** What pg-boss runs its SQL through (`{ db }` on send): here, the caller's transaction. */
export type SqlExecutor = { executeSql(text: string, values?: unknown[]): Promise<{ rows: unknown[] }> };

type RawQuery = { sql: string; bindings: unknown[]; method: "raw" };
type TransactionClient = {
  acquireConnection(): Promise<unknown>;
  query(connection: unknown, query: RawQuery): Promise<{ response?: { rows?: unknown[] } }>;
};

/**
 * Jobs sent through this executor commit or roll back with the transaction.
 * pg-boss's SQL repeats `$n` placeholders, and Postgres types each one from all its uses; Knex's `?`
 * bindings would split a repeated one into several differently typed parameters. So the statement
 * goes, placeholders untouched, to the transaction's own connection, through Knex's client (which
 * refuses a connection or a transaction that is not this one's).
 */
export function knexExecutor(trx: Knex.Transaction): SqlExecutor {
  const client = trx.client as TransactionClient;
  return {
    async executeSql(text, values = []) {
      const connection = await client.acquireConnection();
      const result = await client.query(connection, {
        sql: text,
        bindings: values.map((v) => (v === undefined ? null : v)),
        method: "raw",
      });
      return { rows: result.response?.rows ?? [] };
    },
  };
}

/** Run `work` inside `db` when it is a transaction, else inside a transaction of its own. */
export function inTransaction<T>(db: Knex | Knex.Transaction, work: (trx: Knex.Transaction) => Promise<T>): Promise<T> {
  return "isTransaction" in db && db.isTransaction ? work(db as Knex.Transaction) : db.transaction(work);
}
