"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";

import { vendorAction } from "@/lib/actions/vendor-action";
import { createPersonalToken, revokePersonalToken } from "@/lib/auth/personal-access-tokens";

export const createTokenAction = vendorAction(
  {
    permission: "tokens.manage",
    schema: z.object({ vendor: z.string(), name: z.string().trim().min(2, "Name the token, e.g. “lab script”.").max(80) }),
  },
  async (input, { vendor, user }) => {
    const token = await createPersonalToken({ vendorId: vendor.id, userId: user.id, name: input.name });
    revalidatePath(`/${vendor.slug}/tokens`);
    return { ok: true, message: "Token created. Copy it now: it is shown only once.", data: { secret: token.secret } };
  },
);

export const revokeTokenAction = vendorAction(
  { permission: "tokens.manage", schema: z.object({ vendor: z.string(), id: z.uuid() }) },
  async (input, { vendor, user }) => {
    await revokePersonalToken({ vendorId: vendor.id, userId: user.id, id: input.id });
    revalidatePath(`/${vendor.slug}/tokens`);
    return { ok: true, message: "Token revoked." };
  },
);
