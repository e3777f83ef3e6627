import type { ReactNode } from "react";

import { cautionPropsSchema } from "@/content-schema/mdx-components";
import { cautionKindLabels } from "@/content-schema/sheet-kinds";

import { CautionIcon } from "./caution-icon";

export type CautionMdxProps = { kind?: string; title?: string; children?: ReactNode };

/** A hazard box: amber, with an icon and the hazard's word, so colour is never the only signal. */
export function Caution({ kind, title, children }: CautionMdxProps) {
  const parsed = cautionPropsSchema.safeParse({ kind, title });
  const props = parsed.success ? parsed.data : { kind: "general" as const, title: undefined };
  const word = cautionKindLabels[props.kind];
  return (
    <aside
      role="note"
      aria-label={`${word}${props.title ? `: ${props.title}` : ""}`}
      data-caution={props.kind}
      className="my-6 break-inside-avoid rounded-md border border-amber-300 border-l-4 border-l-amber-600 bg-amber-50 px-4 py-3 text-stone-900 print:border-stone-800 print:bg-white"
    >
      <p className="flex flex-wrap items-center gap-x-2 font-semibold text-amber-900 print:text-black">
        <CautionIcon />
        <span className="text-xs uppercase tracking-wider">{word}</span>
        {props.title ? <span>{props.title}</span> : null}
      </p>
      <div className="mt-1 text-sm leading-relaxed [&_p]:my-1">{children}</div>
    </aside>
  );
}
