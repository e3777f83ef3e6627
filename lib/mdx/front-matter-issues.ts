import { LineCounter, parseDocument } from "yaml";
import type { z } from "zod";

import { sheetFrontMatterSchema, type SheetFrontMatter } from "@/content-schema/sheet-front-matter";

import type { SheetIssue } from "./sheet-issue";
import { yamlErrorSentence } from "./yaml-error-sentence";
import { yamlPathOffset } from "./yaml-path-position";

export type FrontMatterResult = { frontMatter?: SheetFrontMatter; issues: SheetIssue[] };

export function formatPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>(
    (out, step) => (typeof step === "number" ? `${out}[${step}]` : out ? `${out}.${String(step)}` : String(step)),
    "",
  );
}

function zodMessage(issue: z.core.$ZodIssue, path: string, unknownKey?: string): string {
  if (unknownKey !== undefined) {
    const where = path ? ` in ${path}` : "";
    return `Unknown field “${unknownKey}”${where}; check the spelling.`;
  }
  if (issue.code === "invalid_type" && issue.input === undefined) return `${path} is required.`;
  return path ? `${path}: ${issue.message}` : issue.message;
}

/**
 * Parses and validates the YAML front matter. `firstLine` is the file line where the YAML
 * text starts, so every issue names its line in the whole file.
 */
export function checkFrontMatter(yamlText: string, firstLine: number): FrontMatterResult {
  const lineCounter = new LineCounter();
  const doc = parseDocument(yamlText, { lineCounter, prettyErrors: true, uniqueKeys: true });
  const at = (offset: number) => {
    const pos = lineCounter.linePos(offset);
    return { line: pos.line + firstLine - 1, column: pos.col };
  };

  const yamlIssues: SheetIssue[] = [
    // yaml's own "at line N, column M" counts from the front matter, not the file: the sentence leaves it out.
    ...doc.errors.map((e) => ({ ...at(e.pos[0]), message: yamlErrorSentence(e.code, e.message), severity: "error" as const })),
    ...doc.warnings.map((w) => ({ ...at(w.pos[0]), message: yamlErrorSentence(w.code, w.message), severity: "warning" as const })),
  ];
  if (doc.errors.length) return { issues: yamlIssues };

  let value: unknown;
  try {
    value = doc.toJS({ maxAliasCount: 50 });
  } catch {
    // yaml refuses to expand aliases past the count (an "alias bomb"): a problem with the sheet, not a crash.
    return {
      issues: [
        ...yamlIssues,
        { line: firstLine, message: "YAML: too many aliases (*name) to expand. Write the values out.", severity: "error" },
      ],
    };
  }
  const parsed = sheetFrontMatterSchema.safeParse(value ?? {}, { reportInput: true });
  if (parsed.success) return { frontMatter: parsed.data, issues: yamlIssues };

  const schemaIssues = parsed.error.issues.flatMap((issue): SheetIssue[] => {
    const keys = issue.code === "unrecognized_keys" ? issue.keys : [undefined];
    return keys.map((key) => ({
      ...at(yamlPathOffset(doc, issue.path, key)),
      path: formatPath(key === undefined ? issue.path : [...issue.path, key]),
      message: zodMessage(issue, formatPath(issue.path), key),
      severity: "error",
    }));
  });
  return { issues: [...yamlIssues, ...schemaIssues] };
}
