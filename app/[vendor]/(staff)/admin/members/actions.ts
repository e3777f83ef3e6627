"use server";

import { revalidatePath } from "next/cache";

import { changeRoleSchema, inviteMemberSchema, removeMemberSchema } from "@/content-schema/members";
import { vendorAction } from "@/lib/actions/vendor-action";
import { changeMemberRole, removeMember } from "@/lib/members/change-member";
import { inviteMember } from "@/lib/members/invite-member";

export const inviteMemberAction = vendorAction(
  { permission: "members.manage", schema: inviteMemberSchema },
  async (input, { vendor, user }) => {
    await inviteMember({
      vendorId: vendor.id,
      vendorSlug: vendor.slug,
      vendorName: vendor.name,
      actorUserId: user.id,
      email: input.email,
      role: input.role,
    });
    revalidatePath(`/${vendor.slug}/admin/members`);
    return { ok: true, message: `Invitation sent to ${input.email}.` };
  },
);

export const changeRoleAction = vendorAction(
  { permission: "members.manage", schema: changeRoleSchema },
  async (input, { vendor, user }) => {
    await changeMemberRole({ vendorId: vendor.id, actorUserId: user.id, memberId: input.memberId, role: input.role });
    revalidatePath(`/${vendor.slug}/admin/members`);
    return { ok: true, message: "Role changed." };
  },
);

export const removeMemberAction = vendorAction(
  { permission: "members.manage", schema: removeMemberSchema },
  async (input, { vendor, user }) => {
    await removeMember({ vendorId: vendor.id, actorUserId: user.id, memberId: input.memberId });
    revalidatePath(`/${vendor.slug}/admin/members`);
    return { ok: true, message: "Member removed." };
  },
);
