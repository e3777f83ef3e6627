"use client";

import { useActionState } from "react";

import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { initialActionState, type FormAction } from "@/lib/actions/action-state";

export function DeleteMachineForm({
  vendorSlug,
  id,
  name,
  deleteMachineAction,
}: {
  vendorSlug: string;
  id: string;
  name: string;
  deleteMachineAction: FormAction;
}) {
  const [state, action] = useActionState(deleteMachineAction, initialActionState);
  return (
    <form action={action} className="mt-8 border-t border-stone-200 pt-4">
      <input type="hidden" name="vendor" value={vendorSlug} />
      <input type="hidden" name="id" value={id} />
      <p className="mb-2 text-sm text-stone-600">Deleting the machine deletes its setups and their outcome reports.</p>
      <SubmitButton variant="danger" pendingText="Deleting…">
        Delete {name}
      </SubmitButton>
      <FormMessage state={state} />
    </form>
  );
}
