// Pure: the text and HTML of one weekly Field-results digest.
export type DigestMail = {
  vendorName: string;
  weekOf: string;
  confidenceLabel: string;
  fieldUrl: string;
  stopUrl: string;
  attention: {
    title: string;
    number: number;
    failed: number;
    outcomes: number;
    lowerPct: string;
    upperPct: string;
    symptom: string | null;
    url: string;
  }[];
  /** All published versions with a failure; `attention` holds the top of them. */
  attentionTotal: number;
  changes: { title: string; number: number; sentence: string }[];
  gaps: string[];
  /** Clusters beyond `gaps`. */
  moreGaps: number;
  /** Registered customers' machines in all. */
  machines: number;
};

function gapLines(m: DigestMail): string[] {
  if (m.machines === 0) return ["No customer has registered a machine yet."];
  if (!m.gaps.length) return ["Every registered machine falls inside a machine class you publish for."];
  return m.moreGaps
    ? [...m.gaps, `… and ${m.moreGaps} more ${m.moreGaps === 1 ? "cluster" : "clusters"} on the Field results page.`]
    : m.gaps;
}

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function renderDigest(m: DigestMail): { subject: string; text: string; html: string } {
  const subject = `Field results for ${m.vendorName}, week of ${m.weekOf}: ${m.attentionTotal} ${m.attentionTotal === 1 ? "version needs" : "versions need"} attention`;
  const gaps = gapLines(m);
  const gapsListed = m.machines > 0 && m.gaps.length > 0;
  const attention = m.attention.map(
    (a, i) =>
      `${i + 1}. ${a.title}, version ${a.number}: failed in ${a.failed} of ${a.outcomes} reports (${m.confidenceLabel} interval ${a.lowerPct}–${a.upperPct})${a.symptom ? `, mostly ${a.symptom.toLowerCase()}` : ""}\n   ${a.url}`,
  );
  const text = [
    `Field results for ${m.vendorName}, week of ${m.weekOf}. Aggregates only: no customer is named.`,
    `\nNeeds attention (ranked by the lower end of the failure interval${m.attentionTotal > m.attention.length ? `; the top ${m.attention.length} of ${m.attentionTotal}` : ""}):`,
    ...(attention.length ? attention : ["  Nothing failed on a published version."]),
    "\nWhat customers changed (suggestions for the next version; nothing is applied for you):",
    ...(m.changes.length
      ? m.changes.map((c) => `- ${c.title}, version ${c.number}: ${c.sentence}`)
      : ["  No “worked after changes” reports yet."]),
    "\nCoverage gaps:",
    ...(gapsListed ? gaps.map((g) => `- ${g}`) : gaps.map((g) => `  ${g}`)),
    `\nOpen Field results: ${m.fieldUrl}`,
    `\nStop the weekly digest: ${m.stopUrl}`,
  ].join("\n");
  const list = (items: string[], empty: string) =>
    items.length ? `<ul>${items.map((i) => `<li>${i}</li>`).join("")}</ul>` : `<p>${esc(empty)}</p>`;
  const html = [
    `<p>Field results for <strong>${esc(m.vendorName)}</strong>, week of ${esc(m.weekOf)}. Aggregates only: no customer is named.</p>`,
    `<h2>Needs attention</h2>`,
    list(
      m.attention.map(
        (a) =>
          `<a href="${esc(a.url)}">${esc(a.title)}, version ${a.number}</a>: failed in ${a.failed} of ${a.outcomes} reports (${esc(m.confidenceLabel)} interval ${esc(a.lowerPct)}–${esc(a.upperPct)})${a.symptom ? `, mostly ${esc(a.symptom.toLowerCase())}` : ""}`,
      ),
      "Nothing failed on a published version.",
    ),
    `<h2>What customers changed</h2><p style="color:#57534e">Suggestions for the next version; nothing is applied for you.</p>`,
    list(
      m.changes.map((c) => `${esc(c.title)}, version ${c.number}: ${esc(c.sentence)}`),
      "No “worked after changes” reports yet.",
    ),
    `<h2>Coverage gaps</h2>`,
    gapsListed ? list(gaps.map(esc), "") : `<p>${esc(gaps[0])}</p>`,
    `<p><a href="${esc(m.fieldUrl)}">Open Field results</a></p>`,
    `<p><a href="${esc(m.stopUrl)}">Stop the weekly digest</a></p>`,
  ].join("\n");
  return { subject, text, html };
}
