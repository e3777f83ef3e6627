"use client";

import { useMemo, useState } from "react";

import { useKeptText } from "@/components/forms/use-kept-text";
import { cutterCsvColumns, requiredCutterCsvColumns } from "@/content-schema/catalogue-cutter";
import { checkCutterCsv, formatCellError } from "@/lib/catalogue/cutter-csv";
import type { ImportMode } from "@/lib/catalogue/import-cutters-types";

type Progress = { done: number; total: number } | null;
type Outcome = { ok: true; imported: number; skipped: number } | { ok: false; message: string; details: string[] } | null;

/** Preview in the browser with the same checks the server runs, then import with a progress bar. */
export function CsvImport({ url, existingSkus, cataloguePath }: { url: string; existingSkus: string[]; cataloguePath: string }) {
  const [csv, setCsv] = useKeptText("csv-text", "");
  const [mode, setMode] = useState<ImportMode>("all-or-nothing");
  const [progress, setProgress] = useState<Progress>(null);
  const [outcome, setOutcome] = useState<Outcome>(null);
  const report = useMemo(() => (csv.trim() ? checkCutterCsv(csv, existingSkus) : null), [csv, existingSkus]);
  const bad = report?.rows.filter((r) => r.errors.length) ?? [];
  const good = (report?.rows.length ?? 0) - bad.length;
  const canImport = report && report.fileErrors.length === 0 && good > 0 && (mode === "valid-rows" || bad.length === 0) && !progress;

  async function run() {
    setOutcome(null);
    setProgress({ done: 0, total: good });
    try {
      const response = await fetch(url, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ csv, mode }),
      });
      if (!response.body) throw new Error("No response");
      const reader = response.body.pipeThrough(new TextDecoderStream()).getReader();
      let buffer = "";
      for (;;) {
        const { value, done } = await reader.read();
        if (done) break;
        buffer += value;
        const lines = buffer.split("\n");
        buffer = lines.pop() ?? "";
        for (const line of lines.filter(Boolean)) {
          const msg = JSON.parse(line) as {
            done?: number;
            total?: number;
            result?: { imported: number; skipped: number };
            error?: { message: string; fieldErrors?: Record<string, string[]> };
            message?: string;
          };
          if (msg.total !== undefined) setProgress({ done: msg.done ?? 0, total: msg.total });
          if (msg.result) setOutcome({ ok: true, ...msg.result });
          if (msg.error) setOutcome({ ok: false, message: msg.error.message, details: msg.error.fieldErrors?.csv ?? [] });
          if (msg.message && !msg.error && !msg.result) setOutcome({ ok: false, message: msg.message, details: [] });
        }
      }
    } catch {
      setOutcome({ ok: false, message: "The import did not finish. Nothing was imported.", details: [] });
    } finally {
      setProgress(null);
    }
  }

  return (
    <div className="space-y-4">
      <p className="text-sm text-stone-700">
        Columns (first line): <code className="num">{Object.values(cutterCsvColumns).join(",")}</code>. Required:{" "}
        <code className="num">{requiredCutterCsvColumns.join(", ")}</code>. Sizes in mm.
      </p>
      <div className="flex flex-col gap-1">
        <label htmlFor="csv-file" className="text-sm font-medium">
          CSV file
        </label>
        <input
          id="csv-file"
          type="file"
          accept=".csv,text/csv"
          className="min-h-11 text-sm"
          onChange={async (e) => {
            const f = e.target.files?.[0];
            if (f) setCsv(await f.text());
            setOutcome(null);
          }}
        />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="csv-text" className="text-sm font-medium">
          …or paste the CSV
        </label>
        <textarea
          id="csv-text"
          rows={8}
          value={csv}
          onChange={(e) => {
            setCsv(e.target.value);
            setOutcome(null);
          }}
          className="rounded border border-stone-300 bg-white p-2 font-mono text-sm"
          spellCheck={false}
        />
      </div>
      {report ? (
        <section aria-labelledby="preview-heading" className="space-y-2">
          <h2 id="preview-heading" className="text-lg font-semibold">
            Preview
          </h2>
          {report.fileErrors.map((e) => (
            <p key={e} role="alert" className="text-sm text-red-800">
              ⚠ {e}
            </p>
          ))}
          {report.rows.length ? (
            <p className="text-sm" role="status">
              <span className="num">{good}</span> row(s) ready, <span className="num">{bad.length}</span> with errors.
            </p>
          ) : null}
          {bad.length ? (
            <ul className="space-y-1 rounded border border-red-300 bg-red-50 p-3 text-sm text-red-900" aria-label="Row errors">
              {bad.flatMap((r) => r.errors.map((e, i) => <li key={`${r.row}-${i}`}>⚠ {formatCellError(r.row, e)}</li>))}
            </ul>
          ) : null}
          {report.rows.length ? (
            <div className="max-h-80 overflow-auto rounded border border-stone-300 bg-white">
              <table className="w-full text-sm">
                <thead className="bg-stone-100">
                  <tr>
                    <th className="px-2 py-1 text-left">Row</th>
                    <th className="px-2 py-1 text-left">SKU</th>
                    <th className="px-2 py-1 text-left">Status</th>
                  </tr>
                </thead>
                <tbody>
                  {report.rows.map((r) => (
                    <tr key={r.row} className="border-t border-stone-200">
                      <td className="num px-2 py-1">{r.row}</td>
                      <td className="num px-2 py-1">{r.sku || "—"}</td>
                      <td className="px-2 py-1">
                        {r.errors.length ? (
                          <span className="text-red-800">⚠ {r.errors.map((e) => e.column).join(", ")}</span>
                        ) : (
                          <span className="text-green-800">✓ ready</span>
                        )}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : null}
          <fieldset className="space-y-1 text-sm">
            <legend className="font-medium">When a row has errors</legend>
            <label className="flex items-center gap-2">
              <input type="radio" name="mode" checked={mode === "all-or-nothing"} onChange={() => setMode("all-or-nothing")} /> Import
              nothing until every row is right
            </label>
            <label className="flex items-center gap-2">
              <input type="radio" name="mode" checked={mode === "valid-rows"} onChange={() => setMode("valid-rows")} /> Import only the rows
              without errors
            </label>
          </fieldset>
          <button
            type="button"
            disabled={!canImport}
            onClick={run}
            className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink disabled:opacity-50"
          >
            Import {mode === "valid-rows" ? good : report.rows.length} cutter(s)
          </button>
        </section>
      ) : null}
      {progress ? (
        <div>
          <label htmlFor="import-progress" className="text-sm">
            Importing <span className="num">{progress.done}</span> of <span className="num">{progress.total}</span>
          </label>
          <progress id="import-progress" max={progress.total || 1} value={progress.done} className="block h-3 w-full max-w-md" />
        </div>
      ) : null}
      {outcome?.ok ? (
        <p role="status" className="text-green-800">
          ✓ Imported {outcome.imported} cutter(s){outcome.skipped ? `, skipped ${outcome.skipped} row(s) with errors` : ""}.{" "}
          <a className="underline" href={cataloguePath}>
            Back to the cutters
          </a>
        </p>
      ) : null}
      {outcome && !outcome.ok ? (
        <div role="alert" className="text-red-800">
          <p>⚠ {outcome.message}</p>
          <ul className="list-disc pl-5 text-sm">
            {outcome.details.map((d) => (
              <li key={d}>{d}</li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
