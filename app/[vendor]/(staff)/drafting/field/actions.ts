"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";

import { vendorAction } from "@/lib/actions/vendor-action";
import { setMailPreference } from "@/lib/mail-preferences/mail-preferences";
import { requestDigest } from "@/lib/field/send-digest";
import { consumeRateLimit } from "@/lib/rate-limit/consume-rate-limit";

const vendorOnly = z.object({ vendor: z.string().min(1) });

export const sendDigestNowAction = vendorAction({ permission: "field.read", schema: vendorOnly }, async (_input, { vendor, user }) => {
  await consumeRateLimit({ key: `field-digest:${vendor.id}:${user.id}`, limit: 5, windowSeconds: 3600 });
  await requestDigest(vendor.id, user.id);
  return { ok: true, message: `This week's digest is on its way to ${user.email}.` };
});

const digestSchema = z.object({ vendor: z.string().min(1), enabled: z.enum(["on", "off"]) });

export const setWeeklyDigestAction = vendorAction({ permission: "field.read", schema: digestSchema }, async (input, { vendor, user }) => {
  await setMailPreference({ vendorId: vendor.id, userId: user.id, kind: "weekly_digest", enabled: input.enabled === "on" });
  revalidatePath(`/${vendor.slug}/drafting/field`);
  return { ok: true, message: input.enabled === "on" ? "The weekly digest is on." : "The weekly digest is off." };
});
