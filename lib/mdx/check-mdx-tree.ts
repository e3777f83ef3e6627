import type { Root } from "mdast";
import type { Node } from "unist";
import { visit } from "unist-util-visit";

import { checkJsxElement, type Report } from "./check-jsx-element";
import { crossCheckProps } from "./cross-check-props";
import type { SheetIssue } from "./sheet-issue";
import { unsafeUrlReason } from "./url-safety";

export type MdxTreeCheckOptions = {
  /** Added to every line: the body's first line in the whole file, minus one. */
  lineOffset?: number;
  /** Operation kinds of the front matter, to check component props against. */
  operationKinds?: readonly string[];
};

/** Every reason the MDX body may not be rendered, each with its line in the whole file. */
export function checkMdxTree(tree: Root, options: MdxTreeCheckOptions = {}): SheetIssue[] {
  const offset = options.lineOffset ?? 0;
  const issues: SheetIssue[] = [];
  const report: Report = (node: Node, message, severity = "error") => {
    const start = node.position?.start;
    issues.push({ line: (start?.line ?? 1) + offset, column: start?.column, message, severity });
  };

  let adaptPanels = 0;
  visit(tree, (node) => {
    switch (node.type) {
      case "mdxjsEsm": {
        const keyword = /^\s*export\b/.test(node.value) ? "export" : "import";
        report(node, `\`${keyword}\` lines are not allowed in a sheet; use only the built-in components.`);
        break;
      }
      case "mdxFlowExpression":
      case "mdxTextExpression":
        report(node, "`{…}` expressions are not allowed in a sheet; write the text or number itself.");
        break;
      case "mdxJsxFlowElement":
      case "mdxJsxTextElement":
        checkJsxElement(node, report);
        // The page has one adapt panel, mounted at the one `#adapt` slot.
        if (node.name === "AdaptPanel" && ++adaptPanels > 1) report(node, "A sheet has one <AdaptPanel />; remove this extra one.");
        if (options.operationKinds) crossCheckProps(node, options.operationKinds, report);
        break;
      case "html":
        report(node, "Raw HTML is not allowed in a sheet; write prose in Markdown.");
        break;
      case "link":
      case "definition": {
        const reason = unsafeUrlReason(node.url, "link");
        if (reason) report(node, reason);
        break;
      }
      case "image": {
        const reason = unsafeUrlReason(node.url, "image");
        if (reason) report(node, reason);
        break;
      }
    }
  });
  return issues;
}
