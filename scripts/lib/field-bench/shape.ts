// The benchmark's scale and data shape (see scripts/bench-field.ts), its types and small helpers.
import type { Knex } from "knex";

import type { ChangeableParam } from "../../../content-schema/outcome-fields";

/** z for a two-sided 95 % interval, the vendors' default confidence. */
export const Z = 1.959964;

/** Each measured phase stops after this long, whatever --iterations says. */
export const PHASE_BUDGET_MS = 60_000;

/** Share of sheets that also have a v2 (their v1 is superseded). */
export const SECOND_VERSION_SHARE = 0.15;

export const SETUPS_PER_OUTCOME = 0.6;

export const MACHINES_PER_CUSTOMER = 2.5;

/** Versions beyond this share of each vendor's (random) order get no setups and so no reports. */
export const REPORTED_SHARE = 0.9;

export const ACTIVITY_DAYS = 30;

export const TICKETS_PER_VENDOR = 100;

// The three machine classes createBenchVendor creates, given distinct reference machines.
export const CLASS_SPECS = [
  // slug, rpm_min, rpm_max, power kW, max feed mm/min, rigidity
  ["light-router", 10_000, 30_000, 0.8, 5_000, 0.35],
  ["rigid-router", 6_000, 24_000, 2.2, 10_000, 0.7],
  ["vmc", 1_000, 10_000, 5.5, 12_000, 1],
] as const;

// Customers' machines: each is one archetype with jitter, rounded as people type numbers in.
export const MACHINE_ARCHETYPES = [
  // preset, share, rpm_min, rpm_max, power kW, max feed mm/min, rigidity
  ["desktop-mini", 0.12, 1_000, 10_000, 0.3, 1_000, 0.25],
  ["trim-router-belt", 0.25, 10_000, 30_000, 0.7, 5_000, 0.35],
  ["hobby-ballscrew-1.5kw", 0.2, 8_000, 24_000, 1.5, 6_000, 0.55],
  ["hobby-ballscrew-2.2kw", 0.18, 6_000, 24_000, 2.2, 8_000, 0.65],
  ["pro-router-atc", 0.1, 6_000, 24_000, 9, 20_000, 0.9],
  ["small-vmc", 0.05, 500, 10_000, 5.5, 12_000, 1],
  ["hf-engraver", 0.1, 18_000, 60_000, 0.8, 6_000, 0.5],
] as const;

/** Typical value of each parameter a customer may change, and the step people round it to. */
export const CHANGE_PARAMS: Record<ChangeableParam, { base: number; step: number }> = {
  rpm: { base: 18_000, step: 100 },
  feedMmMin: { base: 1_800, step: 10 },
  axialDepthMm: { base: 3, step: 0.1 },
  radialDepthMm: { base: 2, step: 0.1 },
  plungeFeedMmMin: { base: 600, step: 10 },
};

export type Options = { outcomes: number; versions: number; vendors: number; machines: number; iterations: number };

export type SheetPick = { vendorId: string; sheetId: string; versions: number };

export type Samples = Map<string, number[]>;

export const fmt = (ms: number) => (ms >= 10_000 ? `${(ms / 1000).toFixed(1)} s` : `${Math.round(ms)} ms`);

/** `(?::text, ?::float8), (…)` and its bindings, for a VALUES list built from a constant table. */
export function valuesList(rows: readonly (readonly (string | number)[])[], types: readonly string[]) {
  return { sql: rows.map(() => `(${types.map((t) => `?::${t}`).join(", ")})`).join(", "), bindings: rows.flat() };
}

/** Splits `total` into `parts` counts that differ by at most one. */
export const split = (total: number, parts: number) =>
  Array.from({ length: parts }, (_, i) => Math.floor(total / parts) + (i < total % parts ? 1 : 0));

export async function step(label: string, run: () => Promise<number | null | void>) {
  const started = performance.now();
  const rows = await run();
  console.log(
    `  ${label.padEnd(44)} ${(typeof rows === "number" ? rows.toLocaleString("en-GB") : "").padStart(10)}  ${fmt(performance.now() - started).padStart(8)}`,
  );
}

export const rowCount = async (query: Promise<{ rowCount: number | null }>) => (await query).rowCount;

export const countRows = async (knex: Knex, table: string) =>
  (await knex.raw<{ rows: { n: number }[] }>(`select count(*)::int as n from ${table}`)).rows[0].n;
