"use server";

import { revalidatePath } from "next/cache";

import { brandingSchema } from "@/content-schema/vendor-branding";
import { vendorAction } from "@/lib/actions/vendor-action";
import { updateBranding } from "@/lib/vendors/update-branding";

export const updateBrandingAction = vendorAction(
  { permission: "vendor.settings", schema: brandingSchema.passthrough() },
  async (input, { vendor, user }) => {
    const file = (input as { logo?: unknown }).logo;
    const logo = file instanceof File && file.size > 0 ? Buffer.from(await file.arrayBuffer()) : null;
    await updateBranding({ vendorId: vendor.id, actorUserId: user.id, input, logo });
    revalidatePath(`/${vendor.slug}`, "layout");
    return { ok: true, message: "Branding and settings saved." };
  },
);
