import "server-only";

import { NextResponse } from "next/server";
import { ZodError } from "zod";

import { CATCHING_UP, isDatabaseUnavailable, RETRY_AFTER_SECONDS } from "@/lib/db/unavailable";
import { DomainError, HTTP_STATUS, RateLimited } from "@/lib/errors/domain-errors";
import { fieldErrorsOf } from "@/lib/errors/zod-field-errors";

/** Typed errors become clear JSON; anything else is logged and answered without a stack trace. */
export function errorResponse(error: unknown): NextResponse {
  if (error instanceof ZodError) {
    return NextResponse.json(
      { error: "invalid_input", message: "The request is not valid.", fieldErrors: fieldErrorsOf(error) },
      { status: 400 },
    );
  }
  if (error instanceof DomainError) {
    const headers: Record<string, string> = {};
    if (error instanceof RateLimited) headers["Retry-After"] = String(error.retryAfterSeconds);
    return NextResponse.json(
      { error: error.code, message: error.message, ...(error.fieldErrors ? { fieldErrors: error.fieldErrors } : {}) },
      { status: HTTP_STATUS[error.code], headers },
    );
  }
  if (isDatabaseUnavailable(error)) {
    // A database restart costs the client a retry, not an error: 503 with when to ask again.
    console.warn("[api] database unavailable:", error instanceof Error ? error.message : error);
    return NextResponse.json(
      { error: "unavailable", message: CATCHING_UP },
      { status: 503, headers: { "Retry-After": String(RETRY_AFTER_SECONDS) } },
    );
  }
  console.error("[api]", error);
  return NextResponse.json({ error: "internal", message: "Something went wrong on our side." }, { status: 500 });
}
