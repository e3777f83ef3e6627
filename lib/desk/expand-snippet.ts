export type SnippetValues = Record<string, string | undefined>;

/** Fills `{{customer.name}}`-style placeholders; unknown ones are left visible so the agent notices. */
export function expandSnippet(body: string, values: SnippetValues): string {
  return body.replace(/\{\{\s*([a-z]+(?:\.[a-z]+)*)\s*\}\}/gi, (whole, key: string) => values[key] ?? whole);
}

export const SNIPPET_PLACEHOLDERS = [
  "customer.name",
  "ticket.number",
  "ticket.subject",
  "agent.name",
  "machine.name",
  "sheet.title",
  "vendor.name",
] as const;
