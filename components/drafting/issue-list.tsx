"use client";

import type { SheetIssue } from "@/lib/mdx/sheet-issue";

/** Problems in the source, each a button that moves the cursor to its line. */
export function IssueList({ issues, onJump }: { issues: SheetIssue[]; onJump: (line: number) => void }) {
  if (issues.length === 0)
    return (
      <p role="status" className="text-sm text-green-800">
        ✓ No problems found.
      </p>
    );
  return (
    <ul aria-label="Problems in the source" className="space-y-1 text-sm">
      {issues.map((issue, i) => (
        <li key={i}>
          <button
            type="button"
            onClick={() => onJump(issue.line)}
            data-line={issue.line}
            className={`w-full rounded px-2 py-1 text-left hover:bg-stone-100 ${issue.severity === "error" ? "text-red-800" : "text-amber-900"}`}
          >
            <span aria-hidden>{issue.severity === "error" ? "⚠" : "!"} </span>
            <span className="font-semibold">
              Line {issue.line}
              {issue.column ? `, column ${issue.column}` : ""}
            </span>
            <span className="sr-only"> ({issue.severity})</span>: {issue.message}
          </button>
        </li>
      ))}
    </ul>
  );
}
