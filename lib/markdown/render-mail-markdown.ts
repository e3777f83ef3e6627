import type { Element, RootContent as HastContent, Root as HastRoot } from "hast";
import type { ListItem, Nodes, Root } from "mdast";
import rehypeSanitize, { defaultSchema, type Options as SanitizeSchema } from "rehype-sanitize";
import rehypeStringify from "rehype-stringify";
import remarkParse from "remark-parse";
import remarkRehype from "remark-rehype";
import { unified } from "unified";

import { SAFE_REMARK_PLUGINS } from "./markdown-plugins";
import { prepareMarkdown } from "./prepare-markdown";
import { safeUrl } from "./safe-url";

// Pure: untrusted Markdown (a ticket reply) as the HTML and plain-text parts of an e-mail, through the same parser
// and tree limits as the page. Raw HTML is never passed through; the HTML is sanitized after rendering.

const SCHEMA: SanitizeSchema = {
  ...defaultSchema,
  tagNames: (defaultSchema.tagNames ?? []).filter((tag) => tag !== "img" && tag !== "input"),
  protocols: { ...defaultSchema.protocols, href: ["http", "https", "mailto"], src: [], cite: [], longDesc: [] },
};

export const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** Every link keeps only an absolute http(s) or mailto address; others lose the link and keep their text. */
function rehypeSafeLinks() {
  return (tree: HastRoot) => {
    const stack: HastContent[] = [...tree.children];
    while (stack.length) {
      const node = stack.pop()!;
      if (node.type !== "element") continue;
      if (node.tagName === "a") limitLink(node);
      stack.push(...node.children);
    }
  };
}

function limitLink(node: Element) {
  const href = safeUrl(String(node.properties.href ?? ""));
  if (href) node.properties.href = href;
  else delete node.properties.href;
}

const parser = unified().use(remarkParse).use(SAFE_REMARK_PLUGINS);
const toHtml = unified().use(remarkRehype).use(rehypeSafeLinks).use(rehypeSanitize, SCHEMA).use(rehypeStringify);

const indent = (text: string, first: string, rest: string) =>
  text
    .split("\n")
    .map((line, i) => (i === 0 ? first : rest) + line)
    .join("\n");

function inlineText(node: Nodes): string {
  switch (node.type) {
    case "text":
    case "inlineCode":
    case "html":
      return node.value;
    case "break":
      return "\n";
    case "link": {
      const text = childrenText(node.children);
      const href = safeUrl(node.url);
      return href && href !== text && `mailto:${text}` !== href ? `${text} (${href})` : text;
    }
    case "footnoteReference":
      return `[${node.label ?? node.identifier}]`;
    default:
      return "children" in node ? childrenText(node.children) : "";
  }
}
const childrenText = (children: Nodes[]) => children.map(inlineText).join("");

function listItemText(item: ListItem, marker: string): string {
  return indent(item.children.map(blockText).join("\n"), marker, " ".repeat(marker.length));
}

/** Plain text that reads like the Markdown without its marks (recursion depth is bounded by the tree limit). */
function blockText(node: Nodes): string {
  switch (node.type) {
    case "root":
    case "blockquote":
    case "footnoteDefinition": {
      const inner = node.children.map(blockText).filter(Boolean).join("\n\n");
      if (node.type === "blockquote") return indent(inner, "> ", "> ");
      if (node.type === "footnoteDefinition") return `[${node.label ?? node.identifier}] ${inner}`;
      return inner;
    }
    case "list":
      return node.children.map((item, i) => listItemText(item, node.ordered ? `${(node.start ?? 1) + i}. ` : "- ")).join("\n");
    case "code":
      return indent(node.value, "    ", "    ");
    case "thematicBreak":
      return "----";
    case "definition":
      return "";
    case "table":
      return node.children.map((row) => row.children.map((cell) => childrenText(cell.children)).join(" | ")).join("\n");
    default:
      return inlineText(node);
  }
}

export function renderMailMarkdown(source: string): { html: string; text: string } {
  const prepared = prepareMarkdown(source);
  if (prepared.kind === "plain") return { html: `<p style="white-space:pre-wrap">${escapeHtml(prepared.text)}</p>`, text: prepared.text };
  const mdast: Root = parser.parse(prepared.text);
  parser.runSync(mdast); // the tree limits change the tree in place
  const text = blockText(mdast);
  const html = toHtml.stringify(toHtml.runSync(mdast));
  return { html, text };
}
