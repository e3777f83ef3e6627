import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";

import { checkMdxBody } from "./check-mdx-body";
import { checkFrontMatter } from "./front-matter-issues";
import { hasErrors, type SheetIssue } from "./sheet-issue";
import { splitFrontMatter } from "./split-front-matter";

export type SheetValidation =
  | { ok: true; frontMatter: SheetFrontMatter; body: string; bodyLine: number; issues: SheetIssue[] }
  | { ok: false; frontMatter?: SheetFrontMatter; body?: string; bodyLine?: number; issues: SheetIssue[] };

const byLine = (a: SheetIssue, b: SheetIssue) => a.line - b.line || (a.column ?? 0) - (b.column ?? 0);

/** Checks a whole sheet source (front matter and MDX body) without running any of it. */
export function validateSheetSource(source: string): SheetValidation {
  const split = splitFrontMatter(source);
  if (!split.ok) return { ok: false, issues: [{ line: split.line, message: split.message, severity: "error" }] };

  const { frontMatter, issues: headIssues } = checkFrontMatter(split.frontMatter, split.frontMatterLine);
  const kinds = frontMatter?.operations.map((op) => op.kind);
  const bodyIssues = checkMdxBody(split.body, split.bodyLine, kinds);
  const issues = [...headIssues, ...bodyIssues].sort(byLine);

  if (frontMatter && !hasErrors(issues)) {
    return { ok: true, frontMatter, body: split.body, bodyLine: split.bodyLine, issues };
  }
  return { ok: false, frontMatter, body: split.body, bodyLine: split.bodyLine, issues };
}
