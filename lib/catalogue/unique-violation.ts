import { InvalidInput } from "@/lib/errors/domain-errors";

/** True for PostgreSQL's unique_violation (23505). */
export function isUniqueViolation(error: unknown): boolean {
  return typeof error === "object" && error !== null && (error as { code?: string }).code === "23505";
}

/** Runs a write; a duplicate key becomes a field error instead of a 500. */
export async function withUniqueField<T>(field: string, message: string, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (isUniqueViolation(error)) throw new InvalidInput(message, { [field]: [message] });
    throw error;
  }
}
