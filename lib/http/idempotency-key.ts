import "server-only";

import { idempotencyKeySchema } from "@/content-schema/ticket-form-fields";
import { InvalidInput } from "@/lib/errors/domain-errors";

/** The optional `Idempotency-Key` header of a POST: a retried request with the same key returns the first result. */
export function idempotencyKeyOf(request: Request): string | undefined {
  const raw = request.headers.get("idempotency-key");
  if (raw === null) return undefined;
  const parsed = idempotencyKeySchema.safeParse(raw);
  if (!parsed.success) throw new InvalidInput("The Idempotency-Key header must be 8 to 100 letters, digits, '-' or '_'.");
  return parsed.data;
}
