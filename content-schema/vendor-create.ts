import { z } from "zod";

import { emailSchema } from "@/content-schema/auth";
import { vendorSlugSchema } from "@/lib/vendors/reserved-slugs";

import { accentColorSchema } from "./vendor";

export const createVendorSchema = z.object({
  slug: vendorSlugSchema,
  name: z.string().trim().min(2, "At least 2 characters.").max(80),
  accentColor: accentColorSchema,
  adminEmail: emailSchema,
});
