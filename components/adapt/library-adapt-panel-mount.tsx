import "server-only";

import type { AdaptContext } from "@/lib/adapt/adapt-context";

import { adaptPanelProps, NOT_ADAPTABLE, type AdaptMountOptions } from "./adapt-panel-inputs";
import { getCachedAdaptContext } from "./cached-adapt-context";
import { LazyAdaptPanel } from "./lazy-adapt-panel";

// This module names only the lazy panel: a server module's client imports share its chunks, so importing the
// eager panel here as well would put the engine, its forms and zod in the Library page's first load.

type MountProps = AdaptMountOptions & { context: Promise<AdaptContext | null> };

/** The adapt panel of a Library page: the sheet's inputs from the cache, the reader's machines per request. */
async function LibraryAdaptPanelMount({ context: pending, ...options }: MountProps) {
  const context = await pending;
  if (!context || !context.operations.length) return <p className="mt-1 text-sm text-stone-600">{NOT_ADAPTABLE}</p>;
  return <LazyAdaptPanel {...await adaptPanelProps(context, options)} />;
}

/**
 * For the Library pages: `renderAdaptPanel` of getCompiledSheet / SheetView. The sheet's adapt inputs are read once
 * for the page and handed to every panel as one object, so the page's RSC data carries them once and the other
 * panels refer to it. `generation` (lib/library/library-generation.ts) keys the cached read, as for the sheet's data.
 */
export function adaptPanelRenderer({ generation, ...options }: Omit<AdaptMountOptions, "operationIndex"> & { generation: string }) {
  let context: Promise<AdaptContext | null> | null = null;
  return function renderAdaptPanel({ index }: { index: number }) {
    context ??= getCachedAdaptContext(options.vendor.id, options.versionId, generation);
    return <LibraryAdaptPanelMount {...options} context={context} operationIndex={index} />;
  };
}
