/** Said to users while the database is restarting or unreachable. */
export const CATCHING_UP = "Swarfbook is catching up; try again in a moment.";
/** The digest a page error carries when the database was unavailable (error boundaries recognise it). */
export const DATABASE_UNAVAILABLE_DIGEST = "SWARFBOOK_DATABASE_UNAVAILABLE";
export const RETRY_AFTER_SECONDS = 5;

// Connection refused/reset/timed out; Postgres shutting down (57P01-57P03) or refusing connections (08xxx).
const CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "EPIPE",
  "ENOTFOUND",
  "57P01",
  "57P02",
  "57P03",
  "08000",
  "08001",
  "08003",
  "08004",
  "08006",
]);
const MESSAGES =
  /Connection terminated|Timeout acquiring a connection|the database system is (starting up|shutting down|in recovery mode)|Client has encountered a connection error|connect ECONNREFUSED/i;

/** Whether an error means "the database is not reachable right now" rather than a fault in the request. */
export function isDatabaseUnavailable(error: unknown, depth = 0): boolean {
  if (!error || typeof error !== "object" || depth > 3) return false;
  const e = error as { code?: unknown; message?: unknown; digest?: unknown; errors?: unknown; cause?: unknown };
  if (e.digest === DATABASE_UNAVAILABLE_DIGEST) return true;
  if (typeof e.code === "string" && CODES.has(e.code)) return true;
  if (typeof e.message === "string" && MESSAGES.test(e.message)) return true;
  // Node reports a refused connection to several addresses as an AggregateError.
  if (Array.isArray(e.errors) && e.errors.some((inner) => isDatabaseUnavailable(inner, depth + 1))) return true;
  return isDatabaseUnavailable(e.cause, depth + 1);
}
