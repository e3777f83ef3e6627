"use client";

import { forwardRef, useRef, type ChangeEvent } from "react";

type Props = {
  value: string;
  onChange: (value: string) => void;
  label: string;
  invalidLines: ReadonlySet<number>;
  readOnly?: boolean;
  id?: string;
};

export const LINE_HEIGHT_PX = 20;
export const SHEET_SOURCE_ID = "sheet-source";

/** A monospace source area with a line-number gutter that scrolls with it; lines with errors are marked. */
export const LineNumberedSource = forwardRef<HTMLTextAreaElement, Props>(function LineNumberedSource(
  { value, onChange, label, invalidLines, readOnly, id = SHEET_SOURCE_ID },
  ref,
) {
  const gutter = useRef<HTMLDivElement>(null);
  const count = value.split("\n").length;
  return (
    <div className="flex h-[70vh] overflow-hidden rounded-md border border-stone-300 bg-white focus-within:ring-2 focus-within:ring-accent">
      <div
        ref={gutter}
        aria-hidden
        className="select-none overflow-hidden border-r border-stone-200 bg-stone-50 py-2 text-right font-mono text-xs text-stone-500"
        style={{ lineHeight: `${LINE_HEIGHT_PX}px` }}
      >
        {Array.from({ length: count }, (_, i) => (
          <div key={i} className={`px-2 ${invalidLines.has(i + 1) ? "bg-red-100 font-bold text-red-800" : ""}`}>
            {invalidLines.has(i + 1) ? "⚠" : ""}
            {i + 1}
          </div>
        ))}
      </div>
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <textarea
        ref={ref}
        id={id}
        value={value}
        readOnly={readOnly}
        spellCheck={false}
        wrap="off"
        onChange={(e: ChangeEvent<HTMLTextAreaElement>) => onChange(e.target.value)}
        onScroll={(e) => {
          if (gutter.current) gutter.current.scrollTop = e.currentTarget.scrollTop;
        }}
        className="flex-1 resize-none overflow-auto whitespace-pre bg-white px-3 py-2 font-mono text-sm outline-none"
        style={{ lineHeight: `${LINE_HEIGHT_PX}px` }}
      />
    </div>
  );
});
