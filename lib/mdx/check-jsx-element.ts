import type { MdxJsxFlowElement, MdxJsxTextElement } from "mdast-util-mdx";
import type { Node } from "unist";

import {
  isMdxComponentName,
  mdxComponentNames,
  mdxComponentSchemas,
  mdxComponentsWithChildren,
  type MdxComponentName,
} from "@/content-schema/mdx-components";

import type { SheetIssueSeverity } from "./sheet-issue";
import { unsafeAttributeReason } from "./url-safety";

export type Report = (node: Node, message: string, severity?: SheetIssueSeverity) => void;
export type JsxElement = MdxJsxFlowElement | MdxJsxTextElement;

// `only` (OperationTable) starts with "on" too; the allowed components' own props are not handlers.
const knownProps = new Set(Object.values(mdxComponentSchemas).flatMap((schema) => Object.keys(schema.shape)));
const isEventHandler = (name: string) => /^on/i.test(name) && !knownProps.has(name);

const allowedList = mdxComponentNames.map((name) => `<${name}>`).join(", ");

function checkName(element: JsxElement, report: Report): MdxComponentName | undefined {
  const { name } = element;
  if (name === null) {
    report(element, "Fragments `<>…</>` are not allowed in a sheet.");
  } else if (/^[a-z]/.test(name) || /[.:]/.test(name)) {
    report(element, `HTML element <${name}> is not allowed in a sheet; write prose in Markdown. Allowed components: ${allowedList}.`);
  } else if (!isMdxComponentName(name)) {
    report(element, `Unknown component <${name}>. Allowed components: ${allowedList}.`);
  } else {
    return name;
  }
  return undefined;
}

/** Checks attributes for script; returns the string props when all are plain strings. */
function readProps(element: JsxElement, report: Report): Record<string, string> | undefined {
  const props: Record<string, string> = {};
  let clean = true;
  for (const attribute of element.attributes) {
    const at: Node = attribute.position ? attribute : element;
    if (attribute.type === "mdxJsxExpressionAttribute") {
      report(at, 'Spread attributes `{…}` are not allowed; write each attribute as name="value".');
      clean = false;
      continue;
    }
    const { name, value } = attribute;
    if (isEventHandler(name)) {
      report(at, `Event handler attribute ${name} is not allowed in a sheet.`);
      clean = false;
    }
    if (value !== null && typeof value === "object") {
      report(at, `Attribute expression ${name}={…} is not allowed (it would be dropped); write ${name}="…" as a string.`);
      clean = false;
      continue;
    }
    if (value === null || value === undefined) {
      report(at, `Attribute ${name} needs a value, e.g. ${name}="…".`);
      clean = false;
      continue;
    }
    const unsafe = unsafeAttributeReason(name, value);
    if (unsafe) {
      report(at, unsafe);
      clean = false;
    }
    props[name] = value;
  }
  return clean ? props : undefined;
}

function hasContent(element: JsxElement): boolean {
  return element.children.some((child) => !(child.type === "text" && child.value.trim() === ""));
}

/** Reports everything wrong with one JSX element of a sheet body. */
export function checkJsxElement(element: JsxElement, report: Report): void {
  const name = checkName(element, report);
  const props = readProps(element, report);
  if (!name) return;
  if (!mdxComponentsWithChildren.has(name) && hasContent(element)) {
    report(element, `<${name}> takes no content; write it self-closing: <${name} … />.`);
  }
  if (!props) return;
  const parsed = mdxComponentSchemas[name].safeParse(props);
  if (parsed.success) return;
  for (const issue of parsed.error.issues) {
    const message =
      issue.code === "unrecognized_keys"
        ? `<${name}> has no attribute ${issue.keys.join(", ")}.`
        : `<${name}> ${issue.path.join(".") || "props"}: ${issue.message}`;
    report(element, message);
  }
}
