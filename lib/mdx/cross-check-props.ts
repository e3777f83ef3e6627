import { adaptPanelPropsSchema, operationTablePropsSchema } from "@/content-schema/mdx-components";

import type { JsxElement, Report } from "./check-jsx-element";

function propsOf(element: JsxElement): Record<string, string> {
  const props: Record<string, string> = {};
  for (const a of element.attributes) if (a.type === "mdxJsxAttribute" && typeof a.value === "string") props[a.name] = a.value;
  return props;
}

// Props that are valid on their own but point at operations the front matter lacks.
export function crossCheckProps(element: JsxElement, kinds: readonly string[], report: Report): void {
  if (element.name === "AdaptPanel") {
    const parsed = adaptPanelPropsSchema.safeParse(propsOf(element));
    if (parsed.success && parsed.data.operation >= kinds.length) {
      report(
        element,
        `<AdaptPanel operation="${parsed.data.operation}"> points past the ${kinds.length} operation(s) in the front matter (counting from 0).`,
      );
    }
  }
  if (element.name === "OperationTable") {
    const parsed = operationTablePropsSchema.safeParse(propsOf(element));
    const missing = parsed.success ? (parsed.data.only ?? []).filter((kind) => !kinds.includes(kind)) : [];
    if (missing.length) report(element, `<OperationTable only="…"> lists ${missing.join(", ")}, which no operation has.`, "warning");
  }
}
