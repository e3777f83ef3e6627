"use client";

import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import { inviteMemberSchema, STAFF_INVITE_ROLES } from "@/content-schema/members";
import type { FormAction } from "@/lib/actions/action-state";
import { ROLE_LABELS } from "@/lib/auth/roles";

export function InviteMemberForm({ vendor, inviteMemberAction }: { vendor: string; inviteMemberAction: FormAction }) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(inviteMemberAction, inviteMemberSchema);
  return (
    <form
      action={formAction}
      onSubmit={onSubmit}
      noValidate
      className="flex flex-wrap items-end gap-3 rounded-lg border border-stone-200 bg-white p-4"
    >
      <input type="hidden" name="vendor" value={vendor} />
      <div className="min-w-64 flex-1">
        <Field
          label="E-mail"
          name="email"
          type="email"
          autoComplete="off"
          errors={errors.email}
          defaultValue={state.ok ? "" : state.values?.email}
          key={state.ok ? state.message : "invite"}
        />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="invite-role" className="text-sm font-medium">
          Role
        </label>
        <select id="invite-role" name="role" defaultValue="engineer" className="min-h-11 rounded border border-stone-300 bg-white px-3">
          {STAFF_INVITE_ROLES.map((role) => (
            <option key={role} value={role}>
              {ROLE_LABELS[role]}
            </option>
          ))}
        </select>
        {errors.role ? <p className="text-sm text-red-800">⚠ {errors.role.join(" ")}</p> : null}
      </div>
      <SubmitButton pendingText="Sending…">Send invitation</SubmitButton>
      <div className="basis-full">
        <FormMessage state={state} success={state.message} />
      </div>
    </form>
  );
}
