// Typed domain errors, mapped to HTTP and to the UI in one place (lib/http/error-response.ts).
export type FieldErrors = Record<string, string[]>;

export class DomainError extends Error {
  constructor(
    readonly code:
      | "not_found"
      | "forbidden"
      | "unauthenticated"
      | "conflict"
      | "invalid_input"
      | "rate_limited"
      | "too_large"
      | "unsupported_media_type",
    message: string,
    readonly fieldErrors?: FieldErrors,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class NotFound extends DomainError {
  constructor(message = "Not found.") {
    super("not_found", message);
  }
}

export class Unauthenticated extends DomainError {
  constructor(message = "Sign in to continue.") {
    super("unauthenticated", message);
  }
}

export class Forbidden extends DomainError {
  constructor(message = "You do not have permission to do that.") {
    super("forbidden", message);
  }
}

export class Conflict extends DomainError {
  constructor(
    message: string,
    readonly details?: Record<string, unknown>,
  ) {
    super("conflict", message);
  }
}

export class InvalidInput extends DomainError {
  constructor(message: string, fieldErrors?: FieldErrors) {
    super("invalid_input", message, fieldErrors);
  }
}

export class RateLimited extends DomainError {
  constructor(readonly retryAfterSeconds: number) {
    super("rate_limited", `Too many attempts. Try again in ${retryAfterSeconds} s.`);
  }
}

export class TooLarge extends DomainError {
  constructor(message = "The request is too large.") {
    super("too_large", message);
  }
}

export class UnsupportedMediaType extends DomainError {
  constructor(message = "Send the body as application/json.") {
    super("unsupported_media_type", message);
  }
}

export const HTTP_STATUS: Record<DomainError["code"], number> = {
  not_found: 404,
  forbidden: 403,
  unauthenticated: 401,
  conflict: 409,
  invalid_input: 400,
  rate_limited: 429,
  too_large: 413,
  unsupported_media_type: 415,
};
