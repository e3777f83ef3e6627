import { ticketMessageSchema, ticketThreadQuerySchema } from "@/content-schema/api-queries";
import { openObject, ticketCreatedResponseSchema } from "@/content-schema/api-responses";
import { createTicketSchema } from "@/content-schema/ticket-create";
import { QUEUE_PAGE_SIZE, queueQuerySchema } from "@/lib/desk/queue-page";

import type { ApiOperation } from "../api-operation";

const V = "/api/v1/vendors/{vendor}";

export const supportOperations: ApiOperation[] = [
  {
    method: "GET",
    path: `${V}/tickets`,
    tag: "Support",
    summary: "A customer's own tickets, or the Desk queue for staff",
    access: "token",
    description: `Customers get their tickets in the customer's view; support staff and admins get the queue, filtered by the query (unknown filters are dropped), ${QUEUE_PAGE_SIZE} tickets a page: \`page\` picks one, \`hasMore\` says whether another follows.`,
    query: queueQuerySchema,
    responses: {
      "200": {
        description: "The tickets; for staff, one page of the queue.",
        schema: openObject("{ tickets: [...] } or, for staff, { tickets: [...], page, pageSize, hasMore }"),
      },
    },
  },
  {
    method: "POST",
    path: `${V}/tickets`,
    tag: "Support",
    summary: "Open a ticket",
    access: "token",
    permission: "support.use",
    rateLimit: { limit: 30, windowSeconds: 60 },
    description: "Repeating the idempotency key returns the same ticket (200, not 201). Webhooks receive ticket.created.",
    body: createTicketSchema,
    idempotencyKey: "body",
    requestExamples: {
      metric: {
        summary: "A question about a sheet",
        value: { subject: "Chatter on the 6 mm slot", body: "At 18 000 rpm and 1800 mm/min, ap 1.5 mm.", idempotencyKey: "7f3c9a2e41b8" },
      },
    },
    responses: {
      "201": { description: "Opened.", schema: ticketCreatedResponseSchema },
      "200": { description: "The same key again: the first ticket.", schema: ticketCreatedResponseSchema },
    },
    errors: [413, 415],
  },
  {
    method: "GET",
    path: `${V}/tickets/{ticket}`,
    tag: "Support",
    summary: "One ticket with its thread",
    access: "token",
    description:
      "A long thread comes folded: the question, the latest messages, and earlierCount for those left out; messages=all gives every one.",
    query: ticketThreadQuerySchema,
    responses: {
      "200": {
        description: "Customers get their own ticket in the customer's view.",
        schema: openObject("{ ticket, messages, earlierCount, attachments, links }"),
      },
    },
  },
  {
    method: "POST",
    path: `${V}/tickets/{ticket}/messages`,
    tag: "Support",
    summary: "The customer adds to their ticket",
    access: "token",
    permission: "support.use",
    rateLimit: { limit: 60, windowSeconds: 60 },
    body: ticketMessageSchema,
    idempotencyKey: "header",
    requestExamples: { reply: { summary: "A reply", value: { body: "Lowered vf to 1440 mm/min (57 in/min): quiet now." } } },
    responses: {
      "201": { description: "Added.", schema: openObject("{ message }") },
      "200": { description: "The same Idempotency-Key again." },
    },
    errors: [413, 415],
  },
  {
    method: "POST",
    path: `${V}/attachments`,
    tag: "Support",
    summary: "Upload a file for a ticket",
    access: "token",
    rateLimit: { limit: 60, windowSeconds: 60 },
    description: "The raw file as the body, its name in X-File-Name (URL-encoded); the type is read from the content; 10 MB.",
    bodyType: "raw",
    responses: {
      "201": { description: "Stored; pass its id in attachmentIds.", schema: openObject("{ attachment: { id, fileName, kind, size } }") },
    },
    errors: [413, 415],
  },
  {
    method: "GET",
    path: `${V}/attachments/{attachment}`,
    tag: "Support",
    summary: "Download an attachment",
    access: "token",
    responses: { "200": { description: "The file.", contentType: "application/octet-stream" } },
  },
];
