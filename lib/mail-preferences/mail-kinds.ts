import { z } from "zod";

import type { Role } from "@/lib/auth/roles";

// Pure: the kinds of mail a person can turn on or off, per vendor. Mail a person cannot do without (sign-in links,
// address checks, invitations) and the operator's undelivered-mail summary are not on this list: they always go.
export const MAIL_KINDS = ["change_alerts", "batch_changes", "ticket_notifications", "weekly_digest"] as const;
export const mailKindSchema = z.enum(MAIL_KINDS);
export type MailKind = z.infer<typeof mailKindSchema>;

export const MAIL_KIND_TEXTS: Record<MailKind, { label: string; description: string }> = {
  change_alerts: {
    label: "Change alerts",
    description: "When a sheet you saved a setup from gets a new version: what changed, re-adapted to your machines.",
  },
  batch_changes: {
    label: "Batch mails",
    description: "When the vendor publishes a batch of sheet changes at once: one mail for the whole batch.",
  },
  ticket_notifications: {
    label: "Ticket notifications",
    description: "Replies on your tickets; for support staff, new tickets and customer replies.",
  },
  weekly_digest: {
    label: "Weekly digest",
    description: "Monday's Field-results summary: versions that need attention, customer changes, machines no class covers.",
  },
};

/** The kinds that reach a person with this role, in the order the preferences page lists them. */
export function kindsForRole(role: Role): MailKind[] {
  if (role === "customer") return ["change_alerts", "batch_changes", "ticket_notifications"];
  if (role === "support") return ["ticket_notifications"];
  if (role === "engineer") return ["weekly_digest", "change_alerts", "batch_changes"];
  return ["ticket_notifications", "weekly_digest", "change_alerts", "batch_changes"];
}
