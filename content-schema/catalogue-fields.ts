import { z } from "zod";

/** A number from a form, a CSV cell or JSON: blank is "not given", text is parsed. */
export const formNumber = (what: string) =>
  z.preprocess(
    (value) => (typeof value === "string" ? (value.trim() === "" ? undefined : Number(value.trim().replace(",", "."))) : value),
    z.number({ error: `${what} must be a number.` }).refine(Number.isFinite, `${what} must be a number.`),
  );

export const optionalFormNumber = (what: string) =>
  z.preprocess((value) => (typeof value === "string" && value.trim() === "" ? undefined : value), formNumber(what).optional());

export const optionalText = (max: number) =>
  z.preprocess((value) => (typeof value === "string" && value.trim() === "" ? undefined : value), z.string().trim().max(max).optional());

export const catalogueSlugSchema = z
  .string()
  .trim()
  .min(2, "At least 2 characters.")
  .max(60)
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "Lowercase letters, digits and single hyphens, e.g. cast-acrylic.");
