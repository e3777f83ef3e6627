import { ROLE_LABELS, type Role } from "@/lib/auth/roles";

// Audit entries as words for people ("Sheet superseded"), not their codes ("sheet.supersede").
const LABELS: Record<string, string> = {
  "api_token.create": "API token created",
  "api_token.revoke": "API token revoked",
  "cutter.create": "Cutter added",
  "cutter.image": "Cutter picture changed",
  "cutter.import": "Cutters imported",
  "cutter.update": "Cutter changed",
  "family.approve": "Family batch approved",
  "family.create": "Sheet family defined",
  "family.exclude": "Sheet left out of a family batch",
  "family.generate": "Family batch generated",
  "family.publish": "Family batch published",
  "family.rules": "Family rules changed",
  "machine.create": "Machine registered",
  "machine.delete": "Machine removed",
  "machine.update": "Machine changed",
  "member.invite": "Member invited",
  "member.join": "Member joined",
  "member.remove": "Member removed",
  "member.role": "Role changed",
  "outcome.create": "Outcome reported",
  "setup.create": "Setup saved",
  "sheet.approve": "Sheet approved",
  "sheet.create": "Sheet started",
  "sheet.new_version": "New sheet version started",
  "sheet.publish": "Sheet published",
  "sheet.return_to_draft": "Sheet returned to draft",
  "sheet.submit": "Sheet submitted for review",
  "sheet.supersede": "Sheet superseded",
  "sheet.withdraw": "Sheet withdrawn",
  "ticket.create": "Ticket opened",
  "ticket.handoff": "Ticket handed to engineering",
  "ticket.rating": "Ticket rated",
  "ticket.status": "Ticket status changed",
  "ticket.priority": "Ticket priority changed",
  "ticket.assignee": "Ticket assigned",
  "ticket.tags": "Ticket tags changed",
  "vendor.branding": "Branding changed",
  "vendor.create": "Workspace created",
  "webhook.create": "Webhook added",
  "webhook.delete": "Webhook removed",
  "webhook.resume": "Webhook resumed",
};

/** A role as a word in running text: "support staff", "vendor admin". */
export const roleWord = (role: unknown) =>
  typeof role === "string" && role in ROLE_LABELS ? ROLE_LABELS[role as Role].toLowerCase() : "an unknown role";

/** An audit entry as a sentence fragment: "Sheet superseded", "Role changed: customer → support staff". */
export function describeAuditAction(action: string, details: Record<string, unknown> = {}): string {
  const label = LABELS[action] ?? action.replace(/[._]/g, " ").replace(/^./, (c) => c.toUpperCase());
  if (action === "member.invite" && details.role) return `${label} as ${roleWord(details.role)}`;
  if (action === "member.role" && details.to)
    return `${label}${details.from ? `: ${roleWord(details.from)} → ` : ": "}${roleWord(details.to)}`;
  return label;
}
