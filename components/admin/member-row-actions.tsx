"use client";

import { useActionState } from "react";

import { SubmitButton } from "@/components/forms/submit-button";
import { initialActionState, type FormAction } from "@/lib/actions/action-state";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/auth/roles";

export function MemberRowActions({
  vendor,
  memberId,
  role,
  label,
  changeRoleAction,
  removeMemberAction,
}: {
  vendor: string;
  memberId: string;
  role: Role;
  label: string;
  changeRoleAction: FormAction;
  removeMemberAction: FormAction;
}) {
  const [roleState, roleAction] = useActionState(changeRoleAction, initialActionState);
  const [removeState, removeAction] = useActionState(removeMemberAction, initialActionState);
  const message = [roleState, removeState].find((s) => !s.ok && s.message)?.message;
  return (
    <div className="flex flex-wrap items-center gap-2">
      <form action={roleAction} className="flex items-center gap-2">
        <input type="hidden" name="vendor" value={vendor} />
        <input type="hidden" name="memberId" value={memberId} />
        <label className="sr-only" htmlFor={`role-${memberId}`}>
          Role of {label}
        </label>
        <select id={`role-${memberId}`} name="role" defaultValue={role} className="min-h-11 rounded border border-stone-300 bg-white px-2">
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </select>
        <SubmitButton variant="quiet" pendingText="Saving…">
          Change role
        </SubmitButton>
      </form>
      <form
        action={removeAction}
        onSubmit={(e) => {
          if (!window.confirm(`Remove ${label} from this workspace?`)) e.preventDefault();
        }}
      >
        <input type="hidden" name="vendor" value={vendor} />
        <input type="hidden" name="memberId" value={memberId} />
        <SubmitButton variant="danger" pendingText="Removing…">
          Remove
        </SubmitButton>
      </form>
      {message ? (
        <p role="alert" className="basis-full text-sm text-red-800">
          ⚠ {message}
        </p>
      ) : null}
    </div>
  );
}
