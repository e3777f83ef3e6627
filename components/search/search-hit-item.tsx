"use client";

import { operationKindLabels } from "@/content-schema/sheet-kinds";
import type { SearchHit } from "@/search/run/search-response";

import { HighlightedText } from "./highlighted-text";

type Props = { hit: SearchHit; href: string; id: string; active: boolean; onHover: () => void; onOpen: () => void };

// Ctrl/Cmd-click and a middle click still open the sheet in a new tab, as a link would.
const inNewTab = (event: React.MouseEvent) => event.ctrlKey || event.metaKey || event.shiftKey;

// An option of the combobox's listbox holds no link of its own (ARIA: no interactive content inside an
// option): a click or Enter on the active option opens the sheet.
export function SearchHitItem({ hit, href, id, active, onHover, onOpen }: Props) {
  const cutterText = `${hit.cutter.sku} ${hit.cutter.name}`;
  return (
    <li id={id} role="option" aria-selected={active} data-href={href} onMouseEnter={onHover} onClick={(e) => (inNewTab(e) ? window.open(href, "_blank", "noopener") : onOpen())} onAuxClick={(e) => { if (e.button === 1) window.open(href, "_blank", "noopener"); }} className={`cursor-pointer rounded-lg border bg-white p-4 shadow-sm ${active ? "border-stone-700 ring-2 ring-stone-300" : "border-stone-200"}`}>
      <span className="font-medium text-stone-900 underline-offset-2 hover:underline">
        <HighlightedText text={hit.title} ranges={hit.highlights.title} />
      </span>
      <p className="mt-1 text-sm text-stone-600">
        <HighlightedText text={cutterText} ranges={hit.highlights.cutter} /> · Ø{" "}
        <span className="num">{hit.cutter.diameterMm.toLocaleString("en", { maximumFractionDigits: 3 })} mm</span> · <span className="num">{hit.cutter.flutes}</span> {hit.cutter.flutes === 1 ? "flute" : "flutes"}
      </p>
      <p className="text-sm text-stone-600">
        <HighlightedText text={hit.material.name ?? ""} ranges={hit.highlights.material} />
        {hit.machineClass ? ` · ${hit.machineClass.name}` : null} · {hit.operations.map((op) => operationKindLabels[op]).join(", ")}
      </p>
      <p className="mt-1 line-clamp-2 text-sm text-stone-600"><HighlightedText text={hit.summary} ranges={hit.highlights.summary} /></p>
      <p className="mt-1 text-xs text-stone-600">Version <span className="num">{hit.version}</span></p>
    </li>
  );
}
