export { mdxComponentNames, type MdxComponentName } from "@/content-schema/mdx-components";

export { AdaptPanelSlot } from "./adapt-panel-slot";
export { Caution } from "./caution";
export { createMdxComponents, type MdxComponentMap } from "./create-mdx-components";
export { Figure } from "./figure";
export { OperationTable } from "./operation-table";
export type { SheetRenderContext } from "./sheet-render-context";
