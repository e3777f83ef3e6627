"use client";

import { useActionState } from "react";

import { FormMessage } from "@/components/forms/form-message";
import { initialActionState, type FormAction } from "@/lib/actions/action-state";

/** Change alerts on or off: an e-mail when a sheet I saved a setup from gets a new version. */
export function AlertsToggle({
  vendorSlug,
  enabled,
  setChangeAlertsAction,
}: {
  vendorSlug: string;
  enabled: boolean;
  setChangeAlertsAction: FormAction;
}) {
  const [state, action, pending] = useActionState(setChangeAlertsAction, initialActionState);
  return (
    <form action={action} className="flex flex-wrap items-center gap-3 text-sm">
      <input type="hidden" name="vendor" value={vendorSlug} />
      <input type="hidden" name="enabled" value={enabled ? "off" : "on"} />
      <span>
        Change alerts by e-mail: <strong>{enabled ? "on" : "off"}</strong>
      </span>
      <button type="submit" disabled={pending} className="min-h-11 rounded border border-stone-300 bg-white px-3">
        {enabled ? "Stop change alerts" : "Send me change alerts"}
      </button>
      <FormMessage state={state} />
    </form>
  );
}
