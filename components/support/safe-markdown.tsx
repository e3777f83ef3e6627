import type { ReactNode } from "react";

import { type Inline, parseBlocks, parseInline } from "./markdown-blocks";

function renderInline(text: string): ReactNode[] {
  return parseInline(text).map((node: Inline, i) => {
    switch (node.type) {
      case "text":
        return node.text;
      case "code":
        return <code key={i} className="rounded bg-stone-100 px-1 font-mono text-[0.9em]">{node.text}</code>;
      case "strong":
        return <strong key={i}>{node.text}</strong>;
      case "em":
        return <em key={i}>{node.text}</em>;
      case "link":
        return <a key={i} href={node.href} rel="noopener noreferrer nofollow" target="_blank" className="text-accent underline underline-offset-2">{node.text}</a>;
      case "break":
        return <br key={i} />;
    }
  });
}

/**
 * User Markdown (tickets, replies) as React elements: paragraphs, lists, code, bold, italic, quotes
 * and http(s) links. Text is never parsed as HTML, so nothing a user writes becomes markup.
 */
export function SafeMarkdown({ source }: { source: string }) {
  return (
    <div className="space-y-2 text-[0.95rem] leading-relaxed">
      {parseBlocks(source).map((block, i) => {
        switch (block.type) {
          case "heading":
            return <p key={i} className="font-semibold">{renderInline(block.text)}</p>;
          case "code":
            return <pre key={i} className="overflow-x-auto rounded bg-stone-900 p-3 font-mono text-sm text-stone-100"><code>{block.text}</code></pre>;
          case "quote":
            return <blockquote key={i} className="border-l-4 border-stone-300 pl-3 text-stone-600">{renderInline(block.text)}</blockquote>;
          case "list": {
            const items = block.items.map((item, j) => <li key={j}>{renderInline(item)}</li>);
            return block.ordered ? <ol key={i} className="list-decimal pl-6">{items}</ol> : <ul key={i} className="list-disc pl-6">{items}</ul>;
          }
          default:
            return <p key={i}>{renderInline(block.text)}</p>;
        }
      })}
    </div>
  );
}
