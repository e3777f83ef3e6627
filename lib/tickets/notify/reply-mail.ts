import { escapeHtml, renderMailMarkdown } from "@/lib/markdown/render-mail-markdown";

// Pure: the text and HTML parts of a ticket-reply notification. The reply is Markdown written by a person, so it
// goes through the safe Markdown renderer: formatted in the HTML part, without its marks in the text part.

export const REPLY_ABOVE = "-- Reply above this line to add to the ticket --";

type ReplyMail = {
  intro: string;
  body: string;
  note?: string;
  linkLabel: string;
  link: string;
};

export function renderReplyMail({ intro, body, note, linkLabel, link }: ReplyMail): { text: string; html: string } {
  const reply = renderMailMarkdown(body);
  const text = [REPLY_ABOVE, "", intro, "", reply.text, ...(note ? ["", note] : []), "", `${linkLabel}: ${link}`, ""].join("\n");
  const html = [
    `<p style="color:#78716c">${escapeHtml(REPLY_ABOVE)}</p>`,
    `<p>${escapeHtml(intro)}</p>`,
    `<div style="border-left:4px solid #d6d3d1;padding-left:12px">${reply.html}</div>`,
    note ? `<p>${escapeHtml(note)}</p>` : "",
    `<p><a href="${escapeHtml(link)}">${escapeHtml(linkLabel)}</a></p>`,
  ].join("\n");
  return { text, html };
}
