import type { Nodes, Parents, Root, RootContent } from "mdast";

// Pure: a remark plugin shared by the page and the mail renderer. It walks the tree without recursion, so it is
// safe on any depth, and leaves a tree the recursive steps after it (to HTML, to React) can always handle.

/** Deeper nodes are flattened into their text. */
export const MAX_TREE_DEPTH = 40;

const PHRASING_PARENTS = new Set(["paragraph", "heading", "emphasis", "strong", "delete", "link", "linkReference", "tableCell"]);

/** The text of a subtree, without recursion. */
export function textOf(node: Nodes): string {
  let out = "";
  const stack: Nodes[] = [node];
  while (stack.length) {
    const current = stack.pop()!;
    if ("value" in current && typeof current.value === "string") out += current.value;
    else if (current.type === "image" || current.type === "imageReference") out += current.alt ?? "";
    if ("children" in current) for (let i = current.children.length - 1; i >= 0; i--) stack.push(current.children[i]);
  }
  return out;
}

function asText(parent: Parents, value: string): RootContent {
  const text = { type: "text" as const, value };
  return PHRASING_PARENTS.has(parent.type) ? text : { type: "paragraph", children: [text] };
}

/** Raw HTML shows as the text it is; images become links (no remote image loads when a message is opened). */
function safeNode(parent: Parents, node: RootContent): RootContent {
  if (node.type === "html") return asText(parent, node.value);
  if (node.type === "image")
    return { type: "link", url: node.url, title: node.title, children: [{ type: "text", value: node.alt || node.url }] };
  if (node.type === "imageReference") {
    return {
      type: "linkReference",
      identifier: node.identifier,
      label: node.label,
      referenceType: node.referenceType,
      children: [{ type: "text", value: node.alt || node.label || node.identifier }],
    };
  }
  return node;
}

export function safeTree(tree: Root, maxDepth: number = MAX_TREE_DEPTH): void {
  const stack: Array<{ node: Parents; depth: number }> = [{ node: tree, depth: 0 }];
  while (stack.length) {
    const { node, depth } = stack.pop()!;
    const children: RootContent[] = node.children;
    for (let i = 0; i < children.length; i++) {
      let child = safeNode(node, children[i]);
      if ("children" in child && depth + 1 >= maxDepth) child = asText(node, textOf(child));
      children[i] = child;
      if ("children" in child) stack.push({ node: child, depth: depth + 1 });
    }
  }
}

/** The remark plugin: `unified().use(remarkSafeTree)`. */
export function remarkSafeTree() {
  return (tree: Root) => safeTree(tree);
}
