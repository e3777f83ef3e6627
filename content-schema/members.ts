import { z } from "zod";

import { emailSchema } from "@/content-schema/auth";
import { roleSchema } from "@/lib/auth/roles";

export const STAFF_INVITE_ROLES = ["admin", "engineer", "support"] as const;

export const inviteMemberSchema = z.object({
  vendor: z.string(),
  email: emailSchema,
  role: z.enum(STAFF_INVITE_ROLES, { error: "Choose a staff role." }),
});

export const changeRoleSchema = z.object({
  vendor: z.string(),
  memberId: z.uuid("Unknown member."),
  role: roleSchema,
});

export const removeMemberSchema = z.object({ vendor: z.string(), memberId: z.uuid("Unknown member.") });

export const acceptInvitationSchema = z.object({
  vendor: z.string(),
  token: z.string().min(20).max(200),
  // Name and password are asked only when the invitation creates the account (a signed-in account has both).
  name: z.string().trim().max(120).optional(),
  password: z
    .string()
    .min(10, "At least 10 characters.")
    .max(200)
    .optional()
    .or(z.literal("").transform(() => undefined)),
});
