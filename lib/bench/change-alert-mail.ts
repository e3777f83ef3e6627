import { formatAdaptedChange, type AdaptedChange } from "@/lib/adapt/adapted-diff";
import type { UnitSystem } from "@/lib/machining";
import { formatParameterChange, type OperationDiff } from "@/lib/sheets/parameter-diff";

// Pure: the text and HTML of one change-alert e-mail.

export type AlertSetup = {
  setupName: string;
  machineName: string;
  operationLabel: string;
  setupUrl: string;
  changes: AdaptedChange[];
  error: string | null;
};

export type ChangeAlertMail = {
  vendorName: string;
  sheetTitle: string;
  oldNumber: number;
  newNumber: number;
  changeNote: string;
  versionUrl: string;
  stopUrl: string;
  units: UnitSystem;
  sheetDiff: OperationDiff[];
  setups: AlertSetup[];
};

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function setupLines(s: AlertSetup, units: UnitSystem): string[] {
  const head = s.setupName.includes(s.machineName) ? s.setupName : `${s.setupName} (${s.operationLabel}, on ${s.machineName})`;
  if (s.error) return [head, `  Could not be re-adapted: ${s.error}`];
  if (!s.changes.length) return [head, "  Your adapted numbers stay the same."];
  return [
    head,
    ...s.changes
      .map((c) => formatAdaptedChange(c, units))
      .map((c) => `  ${c.label}: ${c.before} → ${c.after}${c.percent ? ` (${c.percent})` : ""}`),
  ];
}

export function renderChangeAlert(m: ChangeAlertMail): { subject: string; text: string; html: string } {
  const subject = `${m.sheetTitle}: version ${m.newNumber} replaces version ${m.oldNumber}`;
  const sheetLines = m.sheetDiff
    .filter((op) => op.status !== "unchanged")
    .flatMap((op) => [
      `${op.label} (${op.status})`,
      ...op.changes
        .map((c) => formatParameterChange(c, m.units))
        .map((c) => `  ${c.label}: ${c.before} → ${c.after}${c.percent ? ` (${c.percent})` : ""}`),
    ]);
  const text = [
    `${m.vendorName} published version ${m.newNumber} of “${m.sheetTitle}”. You saved setups from version ${m.oldNumber}.`,
    m.changeNote ? `\nWhat the engineers say: ${m.changeNote}` : "",
    "\nRe-adapted to your machines (version " + m.oldNumber + " → version " + m.newNumber + "):",
    ...m.setups.flatMap((s) => setupLines(s, m.units).concat(`  Open: ${s.setupUrl}`)),
    "\nThe sheet as written:",
    ...(sheetLines.length ? sheetLines : ["  No cutting numbers changed; the notes or cautions did."]),
    `\nRead version ${m.newNumber}: ${m.versionUrl}`,
    "\nStarting points only: wear eye and hearing protection, use dust extraction, never leave a cut unattended.",
    `\nStop these e-mails: ${m.stopUrl}`,
  ].join("\n");
  const rows = (changes: AdaptedChange[]) =>
    changes
      .map((c) => formatAdaptedChange(c, m.units))
      .map((c) => `<tr><td>${esc(c.label)}</td><td>${esc(c.before)}</td><td>${esc(c.after)}</td><td>${esc(c.percent)}</td></tr>`)
      .join("");
  const html = [
    `<p>${esc(m.vendorName)} published version ${m.newNumber} of “${esc(m.sheetTitle)}”. You saved setups from version ${m.oldNumber}.</p>`,
    m.changeNote ? `<p><strong>What the engineers say:</strong> ${esc(m.changeNote)}</p>` : "",
    ...m.setups.map((s) =>
      s.error || !s.changes.length
        ? `<h3>${esc(s.setupName)}</h3><p>${esc(s.error ? `Could not be re-adapted: ${s.error}` : "Your adapted numbers stay the same.")}</p>`
        : `<h3>${esc(s.setupName)} <small>(${esc(s.operationLabel)}, on ${esc(s.machineName)})</small></h3><table border="1" cellpadding="4" cellspacing="0"><tr><th>Parameter</th><th>v${m.oldNumber}</th><th>v${m.newNumber}</th><th>Change</th></tr>${rows(s.changes)}</table><p><a href="${esc(s.setupUrl)}">Open the setup</a></p>`,
    ),
    `<p><a href="${esc(m.versionUrl)}">Read version ${m.newNumber}</a></p>`,
    `<p style="color:#57534e">Starting points only: wear eye and hearing protection, use dust extraction, never leave a cut unattended.</p>`,
    `<p><a href="${esc(m.stopUrl)}">Stop these e-mails</a></p>`,
  ].join("\n");
  return { subject, text, html };
}
