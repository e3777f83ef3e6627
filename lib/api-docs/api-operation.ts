import type { z } from "zod";

import type { Permission } from "@/lib/auth/permissions";

export type HttpMethod = "GET" | "POST" | "PUT" | "DELETE";
export type RateLimit = { limit: number; windowSeconds: number };

export type ApiResponse = {
  description: string;
  /** A JSON answer's shape. */
  schema?: z.ZodType;
  /** A non-JSON answer (CSV, PDF, an image, HTML). */
  contentType?: string;
  examples?: Record<string, { summary: string; value: unknown }>;
};

/**
 * One route handler as the OpenAPI document describes it. `body` and `query` are the very schema objects the
 * handler parses with (a unit test checks the route imports and parses them), so the document cannot drift.
 */
export type ApiOperation = {
  method: HttpMethod;
  /** OpenAPI form: /api/v1/vendors/{vendor}/tickets */
  path: string;
  summary: string;
  description?: string;
  tag: string;
  /** Who may call: a public endpoint, or a vendor's endpoint (session cookie or personal access token). */
  access: "public" | "token";
  /** The permission the handler requires (the token's owner must hold it in the vendor). */
  permission?: Permission;
  /** A route with its own bucket; without it the vendor API's shared bucket applies. */
  rateLimit?: RateLimit;
  body?: z.ZodType;
  /** How the body travels when it is not JSON. */
  bodyType?: "json" | "multipart" | "raw";
  query?: z.ZodType;
  /** Query parameters read without a schema (a signed token). */
  extraQuery?: { name: string; description: string; required: boolean }[];
  /** Where the handler hands the body to a use case that parses it (path from the repository root). */
  parsedIn?: string;
  /** Further schema objects the handler parses (a multipart form). */
  alsoParses?: z.ZodType[];
  idempotencyKey?: "header" | "body";
  requestExamples?: Record<string, { summary: string; value: unknown }>;
  responses: Record<string, ApiResponse>;
  /** Error statuses this route can answer besides the ones every route can (400, 404, 429, 503, 500). */
  errors?: number[];
};
