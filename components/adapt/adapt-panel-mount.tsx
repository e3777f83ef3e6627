import "server-only";

import { findAdaptContext } from "@/lib/adapt/page-data";

import { AdaptPanel } from "./adapt-panel";
import { adaptPanelProps, NOT_ADAPTABLE, type AdaptMountOptions } from "./adapt-panel-inputs";

/** Server side of the adapt panel on the Bench, loaded with the page (Library pages use LibraryAdaptPanelMount). */
export async function AdaptPanelMount(options: AdaptMountOptions) {
  const context = await findAdaptContext(options.vendor.id, options.versionId);
  if (!context || !context.operations.length) return <p className="mt-1 text-sm text-stone-600">{NOT_ADAPTABLE}</p>;
  return <AdaptPanel {...await adaptPanelProps(context, options)} />;
}
