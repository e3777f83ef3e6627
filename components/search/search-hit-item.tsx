"use client";

import Link from "next/link";
import type { KeyboardEvent } from "react";

import { operationKindLabels } from "@/content-schema/sheet-kinds";
import type { SearchHit } from "@/search/run/search-response";

import { HighlightedText } from "./highlighted-text";

type Props = { hit: SearchHit; href: string; titleSuffix?: string; onKeyDown: (event: KeyboardEvent<HTMLAnchorElement>) => void };

// Each result is a plain link: Tab reaches it, Enter or a click opens it, and "copy link" and a
// middle click work as on any link. Arrow keys move between results (handled by the list).
export function SearchHitItem({ hit, href, titleSuffix, onKeyDown }: Props) {
  const cutterText = `${hit.cutter.sku} ${hit.cutter.name}`;
  return (
    <li data-href={href}>
      <Link
        href={href}
        onKeyDown={onKeyDown}
        data-search-hit
        className="block h-full rounded-lg border border-stone-200 bg-white p-4 shadow-sm hover:border-stone-500 focus-visible:border-stone-700"
      >
        <span className="font-medium text-stone-900 underline underline-offset-2">
          <HighlightedText text={hit.title} ranges={hit.highlights.title} />
          {titleSuffix ? <span className="font-normal"> · {titleSuffix}</span> : null}
        </span>
        <span className="mt-1 block text-sm text-stone-600">
          <HighlightedText text={cutterText} ranges={hit.highlights.cutter} /> · Ø{" "}
          <span className="num">{hit.cutter.diameterMm.toLocaleString("en", { maximumFractionDigits: 3 })} mm</span> ·{" "}
          <span className="num">{hit.cutter.flutes}</span> {hit.cutter.flutes === 1 ? "flute" : "flutes"}
        </span>
        <span className="block text-sm text-stone-600">
          <HighlightedText text={hit.material.name ?? ""} ranges={hit.highlights.material} />
          {hit.machineClass ? ` · ${hit.machineClass.name}` : null} · {hit.operations.map((op) => operationKindLabels[op]).join(", ")}
        </span>
        <span className="mt-1 line-clamp-2 block text-sm text-stone-600">
          <HighlightedText text={hit.summary} ranges={hit.highlights.summary} />
        </span>
        <span className="mt-1 block text-xs text-stone-600">
          Version <span className="num">{hit.version}</span>
        </span>
      </Link>
    </li>
  );
}
