import { z } from "zod";

import { accentColorSchema } from "./vendor";

const checkbox = z
  .union([z.literal("on"), z.literal("true"), z.literal("")])
  .optional()
  .transform((v) => v === "on" || v === "true");

/** Confidence levels offered for the Wilson interval of Field results (Needs attention ranks by its lower end). */
export const WILSON_CONFIDENCE_CHOICES = ["0.8", "0.9", "0.95", "0.99"] as const;

export const brandingSchema = z.object({
  vendor: z.string(),
  name: z.string().trim().min(2, "At least 2 characters.").max(80, "At most 80 characters."),
  accentColor: accentColorSchema,
  libraryPublic: checkbox,
  requireSecondApproval: checkbox,
  wilsonConfidence: z.enum(WILSON_CONFIDENCE_CHOICES, { error: "Pick 80, 90, 95 or 99 %." }).transform(Number).optional(),
});
export type BrandingInput = z.infer<typeof brandingSchema>;

export const LOGO_MAX_BYTES = 256 * 1024;
export const LOGO_TYPES = ["image/png", "image/jpeg", "image/webp"] as const;
