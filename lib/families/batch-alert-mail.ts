import { formatAdaptedChange } from "@/lib/adapt/adapted-diff";
import type { AlertSetup } from "@/lib/bench/change-alert-mail";
import type { UnitSystem } from "@/lib/machining";
import { formatParameterChange, type OperationDiff } from "@/lib/sheets/parameter-diff";

// Pure: one e-mail to one customer listing every sheet of theirs a family batch changed.

export type BatchAlertSheet = {
  title: string;
  oldNumber: number;
  newNumber: number;
  versionUrl: string;
  sheetDiff: OperationDiff[];
  setups: AlertSetup[];
};
export type BatchAlertMail = {
  vendorName: string;
  familyName: string;
  changeNote: string;
  stopUrl: string;
  units: UnitSystem;
  sheets: BatchAlertSheet[];
};

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const line = (c: { label: string; before: string; after: string; percent: string }) =>
  `${c.label}: ${c.before} → ${c.after}${c.percent ? ` (${c.percent})` : ""}`;

function setupLines(s: AlertSetup, units: UnitSystem): string[] {
  const head = `  ${s.setupName} (${s.operationLabel}, on ${s.machineName})`;
  if (s.error) return [head, `    Could not be re-adapted: ${s.error}`];
  if (!s.changes.length) return [head, "    Your adapted numbers stay the same."];
  return [head, ...s.changes.map((c) => `    ${line(formatAdaptedChange(c, units))}`)];
}

function sheetText(sheet: BatchAlertSheet, units: UnitSystem): string[] {
  const written = sheet.sheetDiff
    .filter((op) => op.status !== "unchanged")
    .flatMap((op) => [`  ${op.label} (${op.status})`, ...op.changes.map((c) => `    ${line(formatParameterChange(c, units))}`)]);
  return [
    `\n${sheet.title}: version ${sheet.oldNumber} → version ${sheet.newNumber}`,
    "  Re-adapted to your machines:",
    ...sheet.setups.flatMap((s) => setupLines(s, units).concat(`    Open: ${s.setupUrl}`)),
    "  The sheet as written:",
    ...(written.length ? written : ["    No cutting numbers changed; the notes or cautions did."]),
    `  Read version ${sheet.newNumber}: ${sheet.versionUrl}`,
  ];
}

function sheetHtml(sheet: BatchAlertSheet, units: UnitSystem): string {
  const setups = sheet.setups
    .map((s) => {
      const rows = s.changes
        .map((c) => formatAdaptedChange(c, units))
        .map((c) => `<tr><td>${esc(c.label)}</td><td>${esc(c.before)}</td><td>${esc(c.after)}</td><td>${esc(c.percent)}</td></tr>`)
        .join("");
      const body = s.error
        ? `<p>${esc(`Could not be re-adapted: ${s.error}`)}</p>`
        : rows
          ? `<table border="1" cellpadding="4" cellspacing="0"><tr><th>Parameter</th><th>v${sheet.oldNumber}</th><th>v${sheet.newNumber}</th><th>Change</th></tr>${rows}</table>`
          : "<p>Your adapted numbers stay the same.</p>";
      return `<h3>${esc(s.setupName)} <small>(${esc(s.operationLabel)}, on ${esc(s.machineName)})</small></h3>${body}<p><a href="${esc(s.setupUrl)}">Open the setup</a></p>`;
    })
    .join("\n");
  return `<h2>${esc(sheet.title)}: version ${sheet.oldNumber} → version ${sheet.newNumber}</h2>\n${setups}\n<p><a href="${esc(sheet.versionUrl)}">Read version ${sheet.newNumber}</a></p>`;
}

export function renderBatchChangeAlert(m: BatchAlertMail): { subject: string; text: string; html: string } {
  const n = m.sheets.length;
  const subject =
    n === 1
      ? `${m.sheets[0].title}: version ${m.sheets[0].newNumber} replaces version ${m.sheets[0].oldNumber}`
      : `${m.vendorName}: ${n} sheets you use have new versions`;
  const intro = `${m.vendorName} published new versions of ${n === 1 ? "a sheet" : `${n} sheets`} you saved setups from (sheet family “${m.familyName}”).`;
  const text = [
    intro,
    `\nWhat the engineers say: ${m.changeNote}`,
    ...m.sheets.flatMap((s) => sheetText(s, m.units)),
    "\nStarting points only: wear eye and hearing protection, use dust extraction, never leave a cut unattended.",
    `\nStop these e-mails: ${m.stopUrl}`,
  ].join("\n");
  const html = [
    `<p>${esc(intro)}</p>`,
    `<p><strong>What the engineers say:</strong> ${esc(m.changeNote)}</p>`,
    ...m.sheets.map((s) => sheetHtml(s, m.units)),
    `<p style="color:#57534e">Starting points only: wear eye and hearing protection, use dust extraction, never leave a cut unattended.</p>`,
    `<p><a href="${esc(m.stopUrl)}">Stop these e-mails</a></p>`,
  ].join("\n");
  return { subject, text, html };
}
