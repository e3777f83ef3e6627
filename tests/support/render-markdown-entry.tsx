import { renderToStaticMarkup } from "react-dom/server";

import { SafeMarkdown } from "@/components/support/safe-markdown";
import { renderMailMarkdown } from "@/lib/markdown/render-mail-markdown";

// Entry points for DeadlineRunner: every path untrusted Markdown is rendered through.
export const renderTicketMarkdown = (source: string): string => renderToStaticMarkup(<SafeMarkdown source={source} />);
export const renderMailParts = (source: string): string => JSON.stringify(renderMailMarkdown(source));
