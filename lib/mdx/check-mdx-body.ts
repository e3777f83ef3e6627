import { createProcessor } from "@mdx-js/mdx";
import type { Root } from "mdast";
import { VFile } from "vfile";

import { remarkSheetGuard } from "./remark-sheet-guard";
import type { SheetIssue } from "./sheet-issue";

type PlaceError = { line?: number; column?: number; place?: { line?: number; column?: number; start?: { line: number; column: number } } };

// Micromark errors carry `place`; some mdast-util-mdx-jsx errors only name it in the text: `(5:1-5:9)`.
const PLACE_IN_TEXT = /\((\d+):(\d+)(?:-\d+:\d+)?\)\s*$/;

function syntaxIssue(error: unknown, lineOffset: number): SheetIssue {
  const e = (error ?? {}) as PlaceError & { reason?: string; message?: string };
  const reason = e.reason ?? e.message ?? String(error);
  const start = e.place && "start" in e.place ? e.place.start : e.place;
  const inText = PLACE_IN_TEXT.exec(reason);
  const line = start?.line ?? e.line ?? (inText ? Number(inText[1]) : 1);
  const column = start?.column ?? e.column ?? (inText ? Number(inText[2]) : undefined);
  return { line: line + lineOffset, column, message: `MDX syntax: ${reason}`, severity: "error" };
}

/**
 * Parses the MDX body (never evaluates it) and runs the sheet guard in collect mode.
 * `bodyLine` is the file line where the body starts.
 */
export function checkMdxBody(body: string, bodyLine: number, operationKinds?: readonly string[]): SheetIssue[] {
  const lineOffset = bodyLine - 1;
  const processor = createProcessor();
  const file = new VFile(body);
  let tree: Root;
  try {
    tree = processor.parse(file) as Root;
  } catch (error) {
    return [syntaxIssue(error, lineOffset)];
  }
  // Only the remark stage matters here: the tree is checked, never compiled or run.
  try {
    remarkSheetGuard({ mode: "collect", lineOffset, operationKinds })(tree, file);
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    return [{ line: bodyLine, message: "The sheet nests quotes, lists or components too deeply to check. Flatten it.", severity: "error" }];
  }
  return file.data.sheetIssues ?? [];
}
