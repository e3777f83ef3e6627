import { apiErrorSchema } from "@/content-schema/api-responses";
import { PERMISSIONS } from "@/lib/auth/permissions";
import { DEFAULT_PUBLIC_RATE, DEFAULT_VENDOR_RATE } from "@/lib/http/rate-defaults";

import { errorExamples } from "./api-examples";
import type { ApiOperation } from "./api-operation";
import { API_OPERATIONS } from "./api-operations";
import { jsonSchemaOf, propertiesOf, type JsonSchema } from "./json-schema";
import { WEBHOOK_VERIFICATION, webhookDocs } from "./webhook-docs";

const ERROR_TEXT: Record<number, string> = {
  400: "The input is not valid: `fieldErrors` says which field and why.",
  401: "Sign in (session) or send a personal access token.",
  403: "Signed in, but the role lacks the permission; or a change with the session cookie came without the app's own Origin.",
  404: "Unknown, or another vendor's: the API does not say which.",
  409: "Conflict with the current state (a newer save, a version already published).",
  413: "The body is too large.",
  415: "Send JSON with Content-Type: application/json.",
  428: "A draft save without the revision it edits.",
  429: "Too many calls: wait for Retry-After seconds.",
  500: "Something went wrong on our side (no details are given).",
  503: "The database is catching up: ask again after Retry-After seconds.",
};

export const API_DESCRIPTION = [
  "The JSON API of Swarfbook: a vendor's Library, Bench, Support, Drafting and Field results for scripts, shops and ERPs.",
  "",
  "**Authentication.** Vendor endpoints (`/api/v1/vendors/{vendor}/…`) take a personal access token (`Authorization: Bearer sbk_…`, made on the Bench) or the browser's session.",
  "A token acts as its owner within the vendor it was made in, with the owner's role; it stops working when the owner leaves the vendor.",
  "Each operation names the permission it needs (`x-swarfbook-permission`, the token's scope) and the roles that hold it.",
  "Changes made with the session cookie must carry the app's own `Origin`; token calls need none.",
  "",
  `**Rate limits.** Vendor endpoints share one bucket of ${DEFAULT_VENDOR_RATE.limit} calls per ${DEFAULT_VENDOR_RATE.windowSeconds} s per token (per client address without a token);`,
  `operations with their own limit (\`x-swarfbook-rate-limit\`) count in their own bucket. Public endpoints allow ${DEFAULT_PUBLIC_RATE.limit} calls per ${DEFAULT_PUBLIC_RATE.windowSeconds} s per client address unless stated.`,
  "Past the limit the answer is 429 with `Retry-After`.",
  "",
  "**Errors** are JSON `{ error, message, fieldErrors? }` (`ApiError`) with a stable `error` code; never a stack trace.",
  "",
  "**Units.** Inputs name their unit (`{ value, unit }`, or text such as `1/4 in`, `3 mm`, `70 in/min`); answers of the calculator carry both systems; stored values are metric.",
  "",
  "**Retries.** Ticket, reply and outcome creation take an idempotency key: repeating a call with the same key returns the first result (200) instead of making another.",
  "",
  "**Webhooks.** " + WEBHOOK_VERIFICATION,
].join("\n");

const pathParams = (path: string) => [...path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);

function operationObject(op: ApiOperation): Record<string, unknown> {
  const parameters: Record<string, unknown>[] = pathParams(op.path).map((name) => ({
    name,
    in: "path",
    required: true,
    schema: { type: "string" },
  }));
  if (op.query) {
    const { properties, required } = propertiesOf(jsonSchemaOf(op.query, "input"));
    for (const [name, schema] of Object.entries(properties)) {
      if (parameters.some((p) => p.name === name)) continue;
      parameters.push({
        name,
        in: "query",
        required: required.has(name),
        schema,
        ...(schema.description ? { description: schema.description } : {}),
      });
    }
  }
  for (const q of op.extraQuery ?? [])
    parameters.push({ name: q.name, in: "query", required: q.required, schema: { type: "string" }, description: q.description });
  if (op.idempotencyKey === "header")
    parameters.push({
      name: "Idempotency-Key",
      in: "header",
      required: false,
      schema: { type: "string", maxLength: 100 },
      description: "Repeat it on a retry: the first result comes back (200).",
    });
  if (op.bodyType === "raw")
    parameters.push({
      name: "X-File-Name",
      in: "header",
      required: false,
      schema: { type: "string" },
      description: "The file's name, URL-encoded.",
    });

  const requestBody = op.body
    ? {
        required: true,
        content: {
          "application/json": { schema: jsonSchemaOf(op.body, "input"), ...(op.requestExamples ? { examples: op.requestExamples } : {}) },
          ...(op.alsoParses?.length ? { "multipart/form-data": { schema: jsonSchemaOf(op.alsoParses[0], "input") } } : {}),
        },
      }
    : op.bodyType === "raw"
      ? {
          required: true,
          content: { "application/octet-stream": { schema: { type: "string", contentMediaType: "application/octet-stream" } } },
        }
      : undefined;

  const responses: Record<string, unknown> = {};
  for (const [status, r] of Object.entries(op.responses)) {
    const content = r.schema
      ? { "application/json": { schema: jsonSchemaOf(r.schema, "output"), ...(r.examples ? { examples: r.examples } : {}) } }
      : r.contentType
        ? { [r.contentType]: { schema: { type: "string", contentMediaType: r.contentType } } }
        : undefined;
    responses[status] = { description: r.description, ...(content ? { content } : {}) };
  }
  const errors = new Set([400, 404, 429, 500, 503, ...(op.access === "token" ? [401, 403] : []), ...(op.errors ?? [])]);
  for (const status of [...errors].sort()) {
    responses[String(status)] ??= { $ref: `#/components/responses/E${status}` };
  }
  const rate = op.rateLimit ?? (op.access === "token" ? DEFAULT_VENDOR_RATE : DEFAULT_PUBLIC_RATE);
  return {
    operationId: operationIdOf(op),
    summary: op.summary,
    ...(op.description ? { description: op.description } : {}),
    tags: [op.tag],
    security: op.access === "token" ? [{ personalAccessToken: [] }, { session: [] }] : [],
    ...(parameters.length ? { parameters } : {}),
    ...(requestBody ? { requestBody } : {}),
    responses,
    ...(op.permission ? { "x-swarfbook-permission": op.permission, "x-swarfbook-roles": PERMISSIONS[op.permission] } : {}),
    "x-swarfbook-rate-limit": { ...rate, bucket: op.rateLimit ? "own" : "shared" },
  };
}

export function operationIdOf(op: ApiOperation): string {
  const words = op.path
    .replace(/^\/api\/v1\/(vendors\/\{vendor\}\/)?/, "")
    .split(/[/.]/)
    .filter(Boolean)
    .map((w) => w.replace(/[{}]/g, ""));
  return [op.method.toLowerCase(), ...words]
    .map((w, i) => (i === 0 ? w : w.replace(/(^|-)(\w)/g, (_m, _d, c: string) => c.toUpperCase())))
    .join("");
}

export function buildOpenApiDocument() {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const op of API_OPERATIONS) (paths[op.path] ??= {})[op.method.toLowerCase()] = operationObject(op);
  const errorSchema: JsonSchema = jsonSchemaOf(apiErrorSchema, "output");
  const exampleFor = (status: number) =>
    status === 400 ? errorExamples.invalid : status === 404 ? errorExamples.notFound : status === 429 ? errorExamples.limited : null;
  return {
    openapi: "3.1.0",
    info: { title: "Swarfbook API", version: "1", description: API_DESCRIPTION },
    servers: [{ url: "/", description: "This Swarfbook installation" }],
    tags: [...new Set(API_OPERATIONS.map((op) => op.tag)), "Webhooks"].map((name) => ({ name })),
    paths,
    webhooks: webhookDocs(),
    components: {
      schemas: { ApiError: errorSchema },
      responses: Object.fromEntries(
        Object.entries(ERROR_TEXT).map(([status, description]) => {
          const example = exampleFor(Number(status));
          return [
            `E${status}`,
            {
              description,
              content: {
                "application/json": { schema: { $ref: "#/components/schemas/ApiError" }, ...(example ? { examples: { example } } : {}) },
              },
            },
          ];
        }),
      ),
      securitySchemes: {
        personalAccessToken: {
          type: "http",
          scheme: "bearer",
          description: "A personal access token (sbk_…) made on the Bench; it acts as its owner within one vendor.",
        },
        session: {
          type: "apiKey",
          in: "cookie",
          name: "__Secure-next-auth.session-token",
          description: "The browser's session after sign-in (next-auth.session-token over plain http).",
        },
      },
    },
  };
}

export type OpenApiDocument = ReturnType<typeof buildOpenApiDocument>;

let built: OpenApiDocument | null = null;
/** Built once per process: the schemas do not change while it runs. */
export function openApiDocument(): OpenApiDocument {
  built ??= buildOpenApiDocument();
  return built;
}
