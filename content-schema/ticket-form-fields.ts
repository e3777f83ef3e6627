import { z } from "zod";

/** An optional id from a form: "" or missing means none. */
export const optionalId = z.preprocess((v) => (v === "" || v === null ? undefined : v), z.uuid().optional());

/** A list of ids from a form (repeated fields arrive as a string or an array) or from JSON. */
export const idList = (max: number) =>
  z.preprocess((v) => (v === undefined || v === "" ? [] : Array.isArray(v) ? v.filter((x) => x !== "") : [v]), z.array(z.uuid()).max(max));

/** Tags as "a, b" text or a list; lowercased, trimmed, unique. */
export const tagList = z.preprocess(
  (v) => (typeof v === "string" ? v.split(",") : v ?? []),
  z
    .array(z.string().trim().toLowerCase().max(40))
    .max(20)
    .transform((tags) => [...new Set(tags.filter(Boolean))]),
);
