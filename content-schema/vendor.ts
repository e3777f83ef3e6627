import { z } from "zod";

import { explainAccentColor } from "@/lib/vendors/explain-accent-color";

export const vendorSettingsSchema = z.object({
  libraryPublic: z.boolean().default(true),
  requireSecondApproval: z.boolean().default(true),
  wilsonConfidence: z.number().min(0.5).max(0.999).default(0.95),
  firstResponseHours: z
    .object({ low: z.number().positive(), normal: z.number().positive(), high: z.number().positive(), urgent: z.number().positive() })
    .default({ low: 72, normal: 24, high: 8, urgent: 2 }),
});
export type VendorSettings = z.infer<typeof vendorSettingsSchema>;

export const accentColorSchema = z
  .string()
  .trim()
  .superRefine((value, ctx) => {
    const why = explainAccentColor(value);
    if (why) ctx.addIssue({ code: "custom", message: why });
  });

export type Vendor = {
  id: string;
  slug: string;
  name: string;
  accentColor: string;
  hasLogo: boolean;
  settings: VendorSettings;
};
