import Markdown, { type Components } from "react-markdown";

import { SAFE_REMARK_PLUGINS } from "@/lib/markdown/markdown-plugins";
import { prepareMarkdown } from "@/lib/markdown/prepare-markdown";
import { safeUrl } from "@/lib/markdown/safe-url";

// Headings inside a message stay below the page's own headings; links leave the site in a new tab without a referrer.
const COMPONENTS: Components = {
  h1: ({ children }) => <p className="font-semibold">{children}</p>,
  h2: ({ children }) => <p className="font-semibold">{children}</p>,
  h3: ({ children }) => <p className="font-semibold">{children}</p>,
  h4: ({ children }) => <p className="font-semibold">{children}</p>,
  h5: ({ children }) => <p className="font-semibold">{children}</p>,
  h6: ({ children }) => <p className="font-semibold">{children}</p>,
  a: ({ href, children }) =>
    href ? (
      <a href={href} rel="noopener noreferrer nofollow" target="_blank" className="text-accent underline underline-offset-2">
        {children}
      </a>
    ) : (
      <span>{children}</span>
    ),
  ul: ({ children }) => <ul className="list-disc pl-6">{children}</ul>,
  ol: ({ children, start }) => (
    <ol start={start} className="list-decimal pl-6">
      {children}
    </ol>
  ),
  blockquote: ({ children }) => <blockquote className="border-l-4 border-stone-300 pl-3 text-stone-600">{children}</blockquote>,
  pre: ({ children }) => (
    <pre className="overflow-x-auto rounded bg-stone-900 p-3 font-mono text-sm text-stone-100 [&>code]:bg-transparent [&>code]:p-0">
      {children}
    </pre>
  ),
  code: ({ children }) => <code className="rounded bg-stone-100 px-1 font-mono text-[0.9em]">{children}</code>,
  table: ({ children }) => (
    <div className="overflow-x-auto">
      <table className="border-collapse text-sm [&_td]:border [&_td]:border-stone-300 [&_td]:px-2 [&_th]:border [&_th]:border-stone-300 [&_th]:px-2">
        {children}
      </table>
    </div>
  ),
};

/**
 * Untrusted Markdown (ticket bodies, replies, internal notes, mail) as React elements. Raw HTML shows as text, only
 * http(s) and mailto links survive, images become links, and the text is bounded before it is parsed
 * (`prepareMarkdown`), so no message can stall the server.
 */
export function SafeMarkdown({ source }: { source: string }) {
  const prepared = prepareMarkdown(source);
  return (
    <div className="space-y-2 text-[0.95rem] leading-relaxed break-words">
      {prepared.kind === "plain" ? (
        <p className="whitespace-pre-wrap">{prepared.text}</p>
      ) : (
        <Markdown remarkPlugins={SAFE_REMARK_PLUGINS} skipHtml urlTransform={safeUrl} components={COMPONENTS}>
          {prepared.text}
        </Markdown>
      )}
    </div>
  );
}
