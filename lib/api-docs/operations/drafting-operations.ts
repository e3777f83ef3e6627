import { draftStateResponseSchema, openObject } from "@/content-schema/api-responses";
import { apiNewSheetSchema, saveDraftSchema, submitDraftSchema, withdrawSchema } from "@/content-schema/sheet-workflow";
import { fieldExportSchema } from "@/content-schema/field-export";

import type { ApiOperation } from "../api-operation";

const V = "/api/v1/vendors/{vendor}";
const source = "---\ntitle: …\n---\n";

export const draftingOperations: ApiOperation[] = [
  {
    method: "POST", path: `${V}/sheets`, tag: "Drafting", summary: "Start a sheet with a first draft from MDX source", access: "token", permission: "sheets.author",
    body: apiNewSheetSchema, requestExamples: { new: { summary: "A new sheet", value: { slug: "acrylic-6mm-slot-router", source } } },
    responses: { "201": { description: "The draft, with the source's issues.", schema: draftStateResponseSchema } },
    errors: [409, 413, 415],
  },
  {
    method: "GET", path: `${V}/sheets/{slug}/draft`, tag: "Drafting", summary: "The open draft's source, state and revision", access: "token", permission: "sheets.author",
    responses: { "200": { description: "The draft.", schema: draftStateResponseSchema } },
  },
  {
    method: "PUT", path: `${V}/sheets/{slug}/draft`, tag: "Drafting", summary: "Save the open draft (or start the next version)", access: "token", permission: "sheets.author",
    description: "Send the revision you read: a newer save answers 409 with the current text; a missing revision on an open draft answers 428.",
    body: saveDraftSchema, requestExamples: { save: { summary: "Save over revision 3", value: { source, revision: 3 } } },
    responses: { "200": { description: "Saved.", schema: draftStateResponseSchema }, "201": { description: "A new version was started.", schema: draftStateResponseSchema } },
    errors: [409, 413, 415, 428],
  },
  {
    method: "POST", path: `${V}/sheets/{slug}/draft/submit`, tag: "Drafting", summary: "Send the draft to review", access: "token", permission: "sheets.author",
    body: submitDraftSchema, requestExamples: { submit: { summary: "With a change note", value: { changeNote: "Slot feed lowered after chatter reports." } } },
    responses: { "200": { description: "In review.", schema: draftStateResponseSchema } },
    errors: [409, 415],
  },
  {
    method: "POST", path: `${V}/sheets/{slug}/draft/approve`, tag: "Drafting", summary: "Approve (an engineer other than the author)", access: "token", permission: "sheets.review",
    responses: { "200": { description: "Approved.", schema: draftStateResponseSchema } },
    errors: [409],
  },
  {
    method: "POST", path: `${V}/sheets/{slug}/draft/publish`, tag: "Drafting", summary: "Publish the approved version", access: "token", permission: "sheets.publish",
    description: "The previous published version becomes superseded; webhooks receive sheet.published and sheet.superseded.",
    responses: { "200": { description: "Published.", schema: draftStateResponseSchema } },
    errors: [409],
  },
  {
    method: "POST", path: `${V}/sheets/{slug}/withdraw`, tag: "Drafting", summary: "Withdraw the published (or a given) version", access: "token", permission: "sheets.publish",
    body: withdrawSchema, requestExamples: { withdraw: { summary: "With a reason readers see", value: { reason: "The coating was changed; new data follow." } } },
    responses: { "200": { description: "Withdrawn.", schema: draftStateResponseSchema } },
    errors: [409, 415],
  },
  {
    method: "GET", path: `${V}/field/{list}`, tag: "Field results", summary: "A Field-results list as CSV", access: "token", permission: "field.read",
    description: "list: needs-attention, customer-changes, coverage-gaps or sheet-versions (with ?sheet=<slug>).",
    query: fieldExportSchema,
    responses: { "200": { description: "CSV with a header row.", contentType: "text/csv" } },
  },
  {
    method: "GET", path: `${V}/field/digest/stop`, tag: "Mail", summary: "Stop the weekly digest (signed link from the mail)", access: "public",
    extraQuery: [{ name: "token", description: "The signed token from the mail.", required: true }],
    responses: { "200": { description: "A page that asks to confirm.", contentType: "text/html" } },
  },
  {
    method: "POST", path: `${V}/field/digest/stop`, tag: "Mail", summary: "Stop the weekly digest (one-click, RFC 8058)", access: "public",
    extraQuery: [{ name: "token", description: "The signed token from the mail.", required: true }],
    responses: { "200": { description: "A page that confirms.", contentType: "text/html" } },
  },
  {
    method: "GET", path: `${V}/tickets/views`, tag: "Desk", summary: "The agent's queue views with live counts", access: "token", permission: "desk.use",
    responses: { "200": { description: "The views.", schema: openObject("{ views: [{ id, name, filters, count }] }") } },
  },
];
