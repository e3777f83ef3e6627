import type { ActionState } from "@/lib/actions/action-state";
import { listCustomerChanges } from "@/lib/field/customer-changes";

import { CustomerChangesList } from "./customer-changes-list";

/** What customers changed across the published versions. */
export async function ChangesSection({
  vendorId,
  vendorSlug,
  startDraft,
}: {
  vendorId: string;
  vendorSlug: string;
  startDraft?: (state: ActionState, form: FormData) => Promise<ActionState>;
}) {
  return <CustomerChangesList items={await listCustomerChanges({ vendorId })} vendorSlug={vendorSlug} startDraft={startDraft} />;
}
