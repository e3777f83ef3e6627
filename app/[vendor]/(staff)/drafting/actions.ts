"use server";

import { z } from "zod";

import { cutterFieldsSchema } from "@/content-schema/catalogue-cutter";
import { machineClassFieldsSchema } from "@/content-schema/catalogue-machine-class";
import { materialFieldsSchema } from "@/content-schema/catalogue-material";
import { vendorAction } from "@/lib/actions/vendor-action";
import { createCutter, updateCutter } from "@/lib/catalogue/save-cutter";
import { saveMachineClass } from "@/lib/catalogue/save-machine-class";
import { saveMaterial } from "@/lib/catalogue/save-material";

const target = z.object({ vendor: z.string(), id: z.uuid().optional() });

export const saveCutterAction = vendorAction(
  { permission: "catalogue.edit", schema: z.intersection(target, cutterFieldsSchema) },
  async ({ vendor: _vendor, id, ...fields }, { vendor, user }) => {
    const saved = id
      ? await updateCutter({ vendorId: vendor.id, userId: user.id, id, fields })
      : await createCutter({ vendorId: vendor.id, userId: user.id, fields });
    return { ok: true, data: { sku: saved.sku } };
  },
);

export const saveMaterialAction = vendorAction(
  { permission: "catalogue.edit", schema: z.intersection(target, materialFieldsSchema) },
  async ({ vendor: _vendor, id, ...fields }, { vendor, user }) => {
    const saved = await saveMaterial({ vendorId: vendor.id, userId: user.id, id, fields });
    return { ok: true, data: { slug: saved.slug } };
  },
);

export const saveMachineClassAction = vendorAction(
  { permission: "catalogue.edit", schema: z.intersection(target, machineClassFieldsSchema) },
  async ({ vendor: _vendor, id, ...fields }, { vendor, user }) => {
    const saved = await saveMachineClass({ vendorId: vendor.id, userId: user.id, id, fields });
    return { ok: true, data: { slug: saved.slug } };
  },
);
