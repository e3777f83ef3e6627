const MARKER = /^-- Reply above this line/i;
const ATTRIBUTION = /^(On\s.+wrote:|Am\s.+schrieb.*:|Le\s.+a écrit\s?:)\s*$/i;
const FORWARD = /^-{2,}\s*(Original Message|Forwarded message)\s*-{2,}/i;
const HEADER_BLOCK = /^(From|Sent|To|Subject):\s/i;

/** The new part of a reply: everything above the quoted notification, attribution line or signature. */
export function stripQuotedText(text: string): string {
  const lines = text.replace(/\r\n?/g, "\n").split("\n");
  const out: string[] = [];
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i];
    const trimmed = line.trim();
    if (MARKER.test(trimmed) || FORWARD.test(trimmed) || line === "-- ") break;
    // Attributions are sometimes wrapped over two lines ("On Tue, ... <x@y>\nwrote:").
    if (ATTRIBUTION.test(trimmed) || (/^On\s/i.test(trimmed) && /^wrote:\s*$/i.test(lines[i + 1]?.trim() ?? ""))) break;
    if (HEADER_BLOCK.test(trimmed) && HEADER_BLOCK.test(lines[i + 1]?.trim() ?? "")) break;
    if (trimmed.startsWith(">")) continue;
    out.push(line);
  }
  return out.join("\n").trim();
}
