import { z } from "zod";

import { emailSchema } from "@/lib/auth/auth-schemas";

import { vendorSlugSchema } from "./reserved-slugs";
import { accentColorSchema } from "./vendor-schema";

export const createVendorSchema = z.object({
  slug: vendorSlugSchema,
  name: z.string().trim().min(2, "At least 2 characters.").max(80),
  accentColor: accentColorSchema,
  adminEmail: emailSchema,
});
