import { cutterQrQuerySchema, sheetListQuerySchema } from "@/content-schema/api-queries";
import { openObject, sheetListResponseSchema, sheetVersionResponseSchema } from "@/content-schema/api-responses";
import { sheetActivitySchema } from "@/content-schema/sheet-activity";
import { searchParamsSchema } from "@/search/run/search-params";

import type { ApiOperation } from "../api-operation";

const V = "/api/v1/vendors/{vendor}";

export const libraryOperations: ApiOperation[] = [
  {
    method: "GET",
    path: `${V}/sheets`,
    tag: "Library",
    summary: "Published sheets",
    access: "token",
    permission: "library.read",
    query: sheetListQuerySchema,
    responses: { "200": { description: "One entry per sheet with a published version.", schema: sheetListResponseSchema } },
  },
  {
    method: "GET",
    path: `${V}/sheets/{slug}`,
    tag: "Library",
    summary: "The current published version of a sheet",
    access: "token",
    permission: "library.read",
    description:
      "Structured data: cutter (ISO 13399 names such as DC, ZEFP, APMX), material, machine class, operations, cautions and the version history. Stored values are metric; the text as written is kept beside them.",
    responses: { "200": { description: "The version.", schema: sheetVersionResponseSchema } },
  },
  {
    method: "GET",
    path: `${V}/sheets/{slug}/versions/{n}`,
    tag: "Library",
    summary: "One readable version (published, superseded or withdrawn)",
    access: "token",
    permission: "library.read",
    responses: { "200": { description: "The version.", schema: sheetVersionResponseSchema } },
  },
  {
    method: "GET",
    path: `${V}/search`,
    tag: "Library",
    summary: "Search the Library",
    access: "token",
    permission: "library.read",
    rateLimit: { limit: 300, windowSeconds: 60 },
    description: 'Words, SKUs, diameters (6 mm, 1/4"), flutes and trade terms; facet selections are hard filters.',
    query: searchParamsSchema,
    responses: { "200": { description: "Hits with facets and paging.", schema: openObject("{ hits, total, facets, page, … }") } },
  },
  {
    method: "GET",
    path: `${V}/cutters/{sku}/qr`,
    tag: "Library",
    summary: "QR code of a cutter's short link",
    access: "token",
    permission: "library.read",
    query: cutterQrQuerySchema,
    responses: { "200": { description: "A PNG or SVG image.", contentType: "image/png" } },
  },
  {
    method: "POST",
    path: `${V}/activity`,
    tag: "Library",
    summary: "Count an adaptation for Field results",
    access: "token",
    permission: "library.read",
    rateLimit: { limit: 120, windowSeconds: 60 },
    body: sheetActivitySchema,
    requestExamples: {
      adaptation: {
        summary: "A reader adapted a version",
        value: { versionId: "3f0c2a1e-8a4b-4c55-9d1e-2b7f6a0c9e11", kind: "adaptation" },
      },
    },
    responses: { "204": { description: "Counted." } },
    errors: [413, 415],
  },
  {
    method: "GET",
    path: `${V}/logo`,
    tag: "Library",
    summary: "The vendor's logo",
    access: "token",
    description: "Public branding: no sign-in needed, served sandboxed.",
    responses: { "200": { description: "The image.", contentType: "image/*" } },
  },
];
