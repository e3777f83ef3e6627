import type { Root } from "mdast";
import type { VFile } from "vfile";

import { checkMdxTree, type MdxTreeCheckOptions } from "./check-mdx-tree";
import { formatIssue, type SheetIssue } from "./sheet-issue";

declare module "vfile" {
  interface DataMap {
    sheetIssues: SheetIssue[];
  }
}

export type SheetGuardOptions = MdxTreeCheckOptions & {
  /** "collect" stores issues in `file.data.sheetIssues`; "throw" (default) fails the compile on any error. */
  mode?: "collect" | "throw";
};

/** Remark plugin: rejects everything a sheet body may not contain (see checkMdxTree). */
export function remarkSheetGuard(options: SheetGuardOptions = {}) {
  return (tree: Root, file: VFile): void => {
    const issues = checkMdxTree(tree, options);
    if (options.mode === "collect") {
      file.data.sheetIssues = [...(file.data.sheetIssues ?? []), ...issues];
      return;
    }
    const errors = issues.filter((issue) => issue.severity === "error");
    if (errors.length) throw new Error(`Sheet body rejected: ${errors.map(formatIssue).join("; ")}`);
  };
}
