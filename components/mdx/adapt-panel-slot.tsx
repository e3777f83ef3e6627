import { adaptPanelPropsSchema } from "@/content-schema/mdx-components";
import { operationKindLabels } from "@/content-schema/sheet-kinds";

import type { SheetRenderContext } from "./sheet-render-context";

export type AdaptPanelMdxProps = { operation?: string };

/** Marks where the page's interactive adapt panel goes, for one operation of the sheet. */
export function AdaptPanelSlot({ operation, context }: AdaptPanelMdxProps & { context: SheetRenderContext }) {
  const parsed = adaptPanelPropsSchema.safeParse({ operation });
  const index = parsed.success ? parsed.data.operation : 0;
  const op = context.frontMatter.operations[index];
  if (!op) return null;
  const name = op.label ?? operationKindLabels[op.kind];
  return (
    <section
      id="adapt"
      data-operation={index}
      aria-labelledby="adapt-heading"
      className="my-8 rounded-md border border-stone-300 bg-white p-4 print:hidden"
    >
      <h2 id="adapt-heading" className="text-base font-semibold text-stone-900">
        Adapt to your machine: {name}
      </h2>
      {context.renderAdaptPanel ? (
        context.renderAdaptPanel({ index, operation: op })
      ) : (
        <p className="mt-1 text-sm text-stone-600">Adapt this operation to your machine in the panel on this page.</p>
      )}
    </section>
  );
}
