import { Validator } from "@seriousme/openapi-schema-validator";
import { describe, expect, it } from "vitest";

import { apiNewSheetSchema, saveDraftSchema } from "@/content-schema/sheet-workflow";
import { API_OPERATIONS } from "@/lib/api-docs/api-operations";
import { buildOpenApiDocument, operationIdOf } from "@/lib/api-docs/openapi-document";

import { driftProblems, listApiHandlers } from "./route-sources";

const key = (o: { method: string; path: string }) => `${o.method} ${o.path}`;

describe("OpenAPI document", () => {
  it("has an entry for every handler under app/api/v1 and none for a handler that does not exist", () => {
    const handlers = listApiHandlers();
    expect(handlers.length).toBeGreaterThan(30);
    const documented = new Set(API_OPERATIONS.map(key));
    const routed = new Set(handlers.map(key));
    expect(
      [...routed].filter((k) => !documented.has(k)),
      "routes without an entry in lib/api-docs",
    ).toEqual([]);
    expect(
      [...documented].filter((k) => !routed.has(k)),
      "entries without a route",
    ).toEqual([]);
    expect(API_OPERATIONS.length).toBe(documented.size);
  });

  it("shows the very schemas, permissions and rate limits the handlers use", async () => {
    const handlers = new Map(listApiHandlers().map((h) => [key(h), h]));
    const problems: string[] = [];
    for (const op of API_OPERATIONS) problems.push(...(await driftProblems(op, handlers.get(key(op))!)));
    expect(problems).toEqual([]);
  });

  it("notices drift: another schema, a changed permission or a changed rate limit", async () => {
    const handlers = new Map(listApiHandlers().map((h) => [key(h), h]));
    const createSheet = API_OPERATIONS.find((o) => key(o) === "POST /api/v1/vendors/{vendor}/sheets")!;
    const handler = handlers.get(key(createSheet))!;
    expect(await driftProblems(createSheet, handler)).toEqual([]);
    // A look-alike schema (same fields, another object) is drift: the document would no longer follow the handler.
    expect(await driftProblems({ ...createSheet, body: apiNewSheetSchema.extend({}) }, handler)).toEqual([
      expect.stringContaining("does not parse with the schema object"),
    ]);
    expect(await driftProblems({ ...createSheet, body: saveDraftSchema }, handler)).toEqual([
      expect.stringContaining("does not parse with the schema object"),
    ]);
    expect(await driftProblems({ ...createSheet, body: undefined }, handler)).toEqual([expect.stringContaining("reads a JSON body")]);
    expect(await driftProblems({ ...createSheet, permission: "sheets.publish" }, handler)).toEqual([
      expect.stringContaining("requires sheets.author"),
    ]);
    expect(await driftProblems({ ...createSheet, rateLimit: { limit: 5, windowSeconds: 60 } }, handler)).toEqual([
      expect.stringContaining("rate limit is the default"),
    ]);
    // A fake handler that parses with its own copy of the schema is caught as well.
    const copy = {
      ...handler,
      chunk: handler.chunk.replace("parseInput(apiNewSheetSchema", "parseInput(localCopy"),
      source: handler.source,
    };
    expect(await driftProblems(createSheet, copy)).toEqual([expect.stringContaining("does not parse with the schema object")]);
  });

  it("is a valid OpenAPI 3.1 document with unique operation ids", async () => {
    const doc = buildOpenApiDocument();
    const validator = new Validator();
    const result = await validator.validate(JSON.parse(JSON.stringify(doc)) as Record<string, unknown>);
    expect(result.errors ?? []).toEqual([]);
    expect(validator.version).toBe("3.1");
    const ids = API_OPERATIONS.map(operationIdOf);
    expect(new Set(ids).size).toBe(ids.length);
    // Internal references only point into components (a zod $defs would dangle inside the document).
    for (const ref of JSON.stringify(doc).match(/"\$ref":"[^"]+"/g) ?? []) expect(ref).toMatch(/"#\/components\//);
  });

  it("documents each request example as its schema accepts it, in both unit systems where units apply", () => {
    for (const op of API_OPERATIONS) {
      for (const [name, example] of Object.entries(op.requestExamples ?? {})) {
        expect(op.body?.safeParse(example.value).success, `${key(op)} example ${name}`).toBe(true);
      }
    }
    for (const path of ["/api/v1/calculate", "/api/v1/vendors/{vendor}/machines", "/api/v1/vendors/{vendor}/setups"]) {
      const op = API_OPERATIONS.find((o) => o.method === "POST" && o.path === path)!;
      expect(Object.keys(op.requestExamples ?? {}), path).toEqual(expect.arrayContaining(["metric", "imperial"]));
    }
    const calculate = buildOpenApiDocument().paths["/api/v1/calculate"].post as {
      responses: Record<
        string,
        { content?: Record<string, { examples?: Record<string, { value: { units: string; metric: object; imperial: object } }> }> }
      >;
    };
    const answers = calculate.responses["200"].content!["application/json"].examples!;
    expect(answers.metric.value.units).toBe("metric");
    expect(answers.imperial.value.units).toBe("imperial");
    expect(Object.keys(answers.imperial.value.metric)).toContain("feed");
  });

  it("describes rate limits, token scopes, error shapes and the signed webhooks", () => {
    const doc = buildOpenApiDocument();
    const publish = doc.paths["/api/v1/vendors/{vendor}/sheets/{slug}/draft/publish"].post as Record<string, unknown>;
    expect(publish["x-swarfbook-permission"]).toBe("sheets.publish");
    expect(publish["x-swarfbook-roles"]).toEqual(["engineer", "admin"]);
    expect(publish["x-swarfbook-rate-limit"]).toEqual({ limit: 300, windowSeconds: 60, bucket: "shared" });
    expect((doc.paths["/api/v1/vendors/{vendor}/tickets"].post as Record<string, unknown>)["x-swarfbook-rate-limit"]).toEqual({
      limit: 30,
      windowSeconds: 60,
      bucket: "own",
    });
    expect(doc.components.schemas.ApiError).toMatchObject({ type: "object", required: ["error", "message"] });
    expect(Object.keys(doc.webhooks).sort()).toEqual([
      "outcome.reported",
      "sheet.published",
      "sheet.superseded",
      "sheet.withdrawn",
      "ticket.answered",
      "ticket.created",
    ]);
    expect(doc.info.description).toContain("HMAC-SHA256");
    expect(doc.info.description).toContain("5 minutes");
  });
});
