import "server-only";

import { adaptPanelProps, NOT_ADAPTABLE, type AdaptMountOptions } from "./adapt-panel-inputs";
import { getCachedAdaptContext } from "./cached-adapt-context";
import { LazyAdaptPanel } from "./lazy-adapt-panel";

// This module names only the lazy panel: a server module's client imports share its chunks, so importing the
// eager panel here as well would put the engine, its forms and zod in the Library page's first load.

/** The adapt panel of a Library page: the sheet's inputs from the cache, the reader's machines per request. */
async function LibraryAdaptPanelMount(options: AdaptMountOptions) {
  const context = await getCachedAdaptContext(options.vendor.id, options.versionId);
  if (!context || !context.operations.length) return <p className="mt-1 text-sm text-stone-600">{NOT_ADAPTABLE}</p>;
  return <LazyAdaptPanel {...await adaptPanelProps(context, options)} />;
}

/** For the Library pages: `renderAdaptPanel` of getCompiledSheet / SheetView. */
export function adaptPanelRenderer(options: Omit<AdaptMountOptions, "operationIndex">) {
  return function renderAdaptPanel({ index }: { index: number }) {
    return <LibraryAdaptPanelMount {...options} operationIndex={index} />;
  };
}
