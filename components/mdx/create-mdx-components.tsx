import type { ComponentType } from "react";

import type { MdxComponentName } from "@/content-schema/mdx-components";

import { AdaptPanelSlot, type AdaptPanelMdxProps } from "./adapt-panel-slot";
import { Caution, type CautionMdxProps } from "./caution";
import { Figure, type FigureMdxProps } from "./figure";
import { OperationTable, type OperationTableMdxProps } from "./operation-table";
import type { SheetRenderContext } from "./sheet-render-context";

type MdxPropsByName = {
  Caution: CautionMdxProps;
  OperationTable: OperationTableMdxProps;
  AdaptPanel: AdaptPanelMdxProps;
  Figure: FigureMdxProps;
};

/** One component per allowed name: adding a name to the schemas without a component fails to type-check. */
export type MdxComponentMap = { [Name in MdxComponentName]: ComponentType<MdxPropsByName[Name]> };

/** The allowlist: the only components a sheet's MDX can render, bound to the page's context. */
export function createMdxComponents(context: SheetRenderContext): MdxComponentMap {
  return {
    Caution,
    OperationTable: (props: OperationTableMdxProps) => <OperationTable {...props} context={context} />,
    AdaptPanel: (props: AdaptPanelMdxProps) => <AdaptPanelSlot {...props} context={context} />,
    Figure: (props: FigureMdxProps) => <Figure {...props} resolveSrc={context.resolveImageSrc} />,
  };
}
