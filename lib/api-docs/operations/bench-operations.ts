import { openObject } from "@/content-schema/api-responses";
import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { outcomeFieldsSchema } from "@/content-schema/outcome-fields";
import { outcomeFormSchema } from "@/content-schema/outcome-form";
import { setupCreateSchema } from "@/content-schema/setup-fields";

import { machineImperialExample, machineMetricExample, setupExampleImperial, setupExampleMetric } from "../api-examples";
import type { ApiOperation } from "../api-operation";

const V = "/api/v1/vendors/{vendor}";
const machineExamples = {
  metric: { summary: "Metric", value: machineMetricExample },
  imperial: { summary: "Imperial (feeds and lengths carry their unit)", value: machineImperialExample },
};
const machine = openObject("{ machine: { id, name, rpmMin, rpmMax, powerKw, maxFeedMmMin, rigidity, … } } (stored in metric units)");

export const benchOperations: ApiOperation[] = [
  {
    method: "GET",
    path: `${V}/machines`,
    tag: "Bench",
    summary: "The caller's machines",
    access: "token",
    permission: "bench.use",
    responses: { "200": { description: "The machines.", schema: openObject("{ machines: [...] }") } },
  },
  {
    method: "POST",
    path: `${V}/machines`,
    tag: "Bench",
    summary: "Register a machine",
    access: "token",
    permission: "bench.use",
    rateLimit: { limit: 60, windowSeconds: 60 },
    body: machineFieldsSchema,
    requestExamples: machineExamples,
    responses: { "201": { description: "Registered.", schema: machine } },
    errors: [413, 415],
  },
  {
    method: "GET",
    path: `${V}/machines/{id}`,
    tag: "Bench",
    summary: "One of the caller's machines",
    access: "token",
    permission: "bench.use",
    responses: { "200": { description: "The machine.", schema: machine } },
  },
  {
    method: "PUT",
    path: `${V}/machines/{id}`,
    tag: "Bench",
    summary: "Replace a machine's fields",
    access: "token",
    permission: "bench.use",
    body: machineFieldsSchema,
    requestExamples: machineExamples,
    responses: { "200": { description: "Saved.", schema: machine } },
    errors: [413, 415],
  },
  {
    method: "DELETE",
    path: `${V}/machines/{id}`,
    tag: "Bench",
    summary: "Remove a machine with its setups and outcomes",
    access: "token",
    permission: "bench.use",
    responses: { "204": { description: "Removed." } },
  },
  {
    method: "GET",
    path: `${V}/setups`,
    tag: "Bench",
    summary: "The caller's setups",
    access: "token",
    permission: "bench.use",
    responses: { "200": { description: "With the last outcome and any newer version.", schema: openObject("{ setups: [...] }") } },
  },
  {
    method: "POST",
    path: `${V}/setups`,
    tag: "Bench",
    summary: "Save a version adapted to a machine",
    access: "token",
    permission: "bench.use",
    rateLimit: { limit: 60, windowSeconds: 60 },
    description: 'Only references and overrides: the server computes the numbers. Overrides take a unit (`3 mm`, `1/8`, `0.125"`).',
    body: setupCreateSchema,
    requestExamples: {
      metric: { summary: "Metric, ae overridden", value: setupExampleMetric },
      imperial: { summary: "Imperial, ap and stick-out overridden", value: setupExampleImperial },
    },
    responses: { "201": { description: "Saved.", schema: openObject("{ setup: { id, name, result: { metric, imperial, … } } }") } },
    errors: [413, 415],
  },
  {
    method: "GET",
    path: `${V}/setups/{id}`,
    tag: "Bench",
    summary: "One setup with its outcome history",
    access: "token",
    permission: "bench.use",
    responses: { "200": { description: "The setup.", schema: openObject("{ setup, outcomes }") } },
  },
  {
    method: "GET",
    path: `${V}/setups/{id}/csv`,
    tag: "Bench",
    summary: "The setup sheet's numbers as CSV",
    access: "token",
    permission: "bench.use",
    responses: { "200": { description: "CSV.", contentType: "text/csv" } },
  },
  {
    method: "GET",
    path: `${V}/setups/{id}/pdf`,
    tag: "Bench",
    summary: "The one-page setup sheet",
    access: "token",
    permission: "bench.use",
    rateLimit: { limit: 30, windowSeconds: 60 },
    responses: { "200": { description: "PDF.", contentType: "application/pdf" } },
  },
  {
    method: "POST",
    path: `${V}/setups/{id}/outcomes`,
    tag: "Bench",
    summary: "Report how a cut went",
    access: "token",
    permission: "bench.use",
    rateLimit: { limit: 30, windowSeconds: 60 },
    description:
      "JSON, or multipart/form-data with a photo (PNG, JPEG or WebP, 10 MB). Changes are in metric machining units (rpm, mm/min, mm). Webhooks receive outcome.reported.",
    body: outcomeFieldsSchema,
    alsoParses: [outcomeFormSchema],
    idempotencyKey: "header",
    requestExamples: {
      asWritten: { summary: "Worked as written", value: { result: "worked_as_written" } },
      changed: {
        summary: "Worked after lowering the feed (metric units)",
        value: { result: "worked_after_changes", changes: { feedMmMin: { from: 1800, to: 1440 } }, notes: "Chatter gone." },
      },
      failed: { summary: "Failed", value: { result: "failed", symptom: "melting_welding" } },
    },
    responses: {
      "201": { description: "Recorded.", schema: openObject("{ outcome: { id, … } }") },
      "200": { description: "The same Idempotency-Key again: the first report." },
    },
    errors: [413, 415],
  },
  {
    method: "GET",
    path: `${V}/setups/{id}/outcomes/{outcomeId}/photo`,
    tag: "Bench",
    summary: "The photo of an outcome report",
    access: "token",
    permission: "bench.use",
    responses: { "200": { description: "The image.", contentType: "image/*" } },
  },
  {
    method: "GET",
    path: `${V}/setups/alerts/stop`,
    tag: "Mail",
    summary: "Stop change alerts (signed link from the mail)",
    access: "public",
    extraQuery: [{ name: "token", description: "The signed token from the mail.", required: true }],
    responses: { "200": { description: "A page that asks to confirm.", contentType: "text/html" } },
  },
  {
    method: "POST",
    path: `${V}/setups/alerts/stop`,
    tag: "Mail",
    summary: "Stop change alerts (one-click, RFC 8058)",
    access: "public",
    extraQuery: [{ name: "token", description: "The signed token from the mail.", required: true }],
    responses: { "200": { description: "A page that confirms.", contentType: "text/html" } },
  },
];
