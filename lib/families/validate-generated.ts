import { checkMdxBody } from "@/lib/mdx/check-mdx-body";
import { checkFrontMatter } from "@/lib/mdx/front-matter-issues";
import { hasErrors, type SheetIssue } from "@/lib/mdx/sheet-issue";
import { splitFrontMatter } from "@/lib/mdx/split-front-matter";
import type { SheetValidation } from "@/lib/mdx/validate-sheet-source";

// Pure: the same checks as validateSheetSource, for thousands of generated sheets whose MDX bodies repeat (one
// per family, rules version and set of rules applied): each distinct body is parsed once, not once per sheet.

const MAX_BODIES = 500;
const bodies = new Map<string, SheetIssue[]>();

function checkBody(body: string, bodyLine: number, kinds: readonly string[] | undefined): SheetIssue[] {
  const key = `${bodyLine}\u0000${kinds?.join(",") ?? ""}\u0000${body}`;
  const known = bodies.get(key);
  if (known) return known;
  const issues = checkMdxBody(body, bodyLine, kinds);
  if (bodies.size >= MAX_BODIES) bodies.clear();
  bodies.set(key, issues);
  return issues;
}

export function validateGeneratedSource(source: string): SheetValidation {
  const split = splitFrontMatter(source);
  if (!split.ok) return { ok: false, issues: [{ line: split.line, message: split.message, severity: "error" }] };
  const { frontMatter, issues: headIssues } = checkFrontMatter(split.frontMatter, split.frontMatterLine);
  const issues = [
    ...headIssues,
    ...checkBody(
      split.body,
      split.bodyLine,
      frontMatter?.operations.map((op) => op.kind),
    ),
  ];
  if (frontMatter && !hasErrors(issues)) return { ok: true, frontMatter, body: split.body, bodyLine: split.bodyLine, issues };
  return { ok: false, frontMatter, body: split.body, bodyLine: split.bodyLine, issues };
}
