"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";

import { machineDeleteSchema, machineFormSchema } from "@/content-schema/machine-fields";
import { setupActionSchema } from "@/content-schema/setup-fields";
import { vendorAction } from "@/lib/actions/vendor-action";
import { createSetup } from "@/lib/bench/create-setup";
import { createMachine, deleteMachine, updateMachine } from "@/lib/bench/machines";
import { setMailPreference } from "@/lib/mail-preferences/mail-preferences";
import { addMyCutter, removeMyCutter } from "@/lib/my-cutters/my-cutters";

export const saveMachineAction = vendorAction({ permission: "bench.use", schema: machineFormSchema }, async (input, { vendor, user }) => {
  const { vendor: _slug, id, ...fields } = input;
  if (id) await updateMachine({ vendorId: vendor.id, userId: user.id, machineId: id, fields });
  else await createMachine({ vendorId: vendor.id, userId: user.id, fields });
  revalidatePath(`/${vendor.slug}/bench`);
  redirect(`/${vendor.slug}/bench`);
});

export const deleteMachineAction = vendorAction(
  { permission: "bench.use", schema: machineDeleteSchema },
  async (input, { vendor, user }) => {
    await deleteMachine({ vendorId: vendor.id, userId: user.id, machineId: input.id });
    revalidatePath(`/${vendor.slug}/bench`);
    redirect(`/${vendor.slug}/bench`);
  },
);

export const saveSetupAction = vendorAction({ permission: "bench.use", schema: setupActionSchema }, async (input, { vendor, user }) => {
  const { vendor: _slug, ...setup } = input;
  const { id } = await createSetup({ vendorId: vendor.id, userId: user.id, input: setup });
  revalidatePath(`/${vendor.slug}/bench`);
  return { ok: true, message: "Saved.", data: { id } };
});

const alertsSchema = z.object({ vendor: z.string().min(1), enabled: z.enum(["on", "off"]) });

export const setChangeAlertsAction = vendorAction({ permission: "bench.use", schema: alertsSchema }, async (input, { vendor, user }) => {
  await setMailPreference({ vendorId: vendor.id, userId: user.id, kind: "change_alerts", enabled: input.enabled === "on" });
  revalidatePath(`/${vendor.slug}/bench`);
  return { ok: true, message: input.enabled === "on" ? "Change alerts are on." : "Change alerts are off." };
});

const addCutterSchema = z.object({
  vendor: z.string().min(1),
  sku: z.string().trim().min(1, "Type the cutter's SKU.").max(80, "An SKU is at most 80 characters."),
});

export const addMyCutterAction = vendorAction({ permission: "bench.use", schema: addCutterSchema }, async (input, { vendor, user }) => {
  const cutter = await addMyCutter({ vendorId: vendor.id, userId: user.id, sku: input.sku });
  revalidatePath(`/${vendor.slug}/bench`);
  revalidatePath(`/${vendor.slug}/library/cutters/${encodeURIComponent(cutter.sku)}`);
  return { ok: true, message: cutter.added ? `${cutter.sku} is in your cutters now.` : `${cutter.sku} was already in your cutters.` };
});

const removeCutterSchema = z.object({ vendor: z.string().min(1), cutterId: z.uuid() });

export const removeMyCutterAction = vendorAction(
  { permission: "bench.use", schema: removeCutterSchema },
  async (input, { vendor, user }) => {
    await removeMyCutter({ vendorId: vendor.id, userId: user.id, cutterId: input.cutterId });
    revalidatePath(`/${vendor.slug}/bench`);
    revalidatePath(`/${vendor.slug}/library`, "layout");
    return { ok: true, message: "Removed from your cutters." };
  },
);
