import { z } from "zod";

import { OPERATION_KINDS } from "@/lib/machining/types";
import { MATERIAL_GROUPS } from "@/search/vocabulary/types";

const optionalText = z
  .string()
  .trim()
  .max(80)
  .optional()
  .transform((v) => v || undefined);
const optionalNumber = <T extends z.ZodNumber>(n: T) =>
  z.preprocess((v) => (v === "" || v === null ? undefined : v), z.coerce.number().pipe(n).optional());

/** Query string of GET /api/v1/vendors/{vendor}/search; facet selections are hard filters. */
export const searchParamsSchema = z.object({
  // The parser caps the words it reads; a longer paste is answered, not refused.
  q: z
    .string()
    .default("")
    .transform((q) => q.slice(0, 2000)),
  material: optionalText.pipe(
    z
      .string()
      .regex(/^[a-z0-9-]+$/)
      .optional(),
  ),
  materialGroup: z.enum(MATERIAL_GROUPS).optional(),
  operation: z.enum(OPERATION_KINDS).optional(),
  diameterMm: optionalNumber(z.number().positive().max(100)),
  flutes: optionalNumber(z.number().int().min(1).max(12)),
  page: optionalNumber(z.number().int().min(1).max(50)),
  perPage: optionalNumber(z.number().int().min(1).max(50)),
});

export type SearchParams = z.infer<typeof searchParamsSchema>;

/** The URL query of a search, in a fixed order and without empty values (used by the page and the API client). */
export function searchParamsToQuery(p: Partial<Record<keyof SearchParams, string | number | undefined>>): string {
  const out = new URLSearchParams();
  for (const key of ["q", "material", "materialGroup", "operation", "diameterMm", "flutes", "page"] as const) {
    const v = p[key];
    if (v !== undefined && v !== "" && !(key === "page" && Number(v) === 1)) out.set(key, String(v));
  }
  return out.toString();
}
