/** MDX body to plain words for the index: no tags, attributes, markup or code fences. */
export function mdxToPlainText(source: string, maxChars = 4000): string {
  return source
    .replace(/^---[\s\S]*?\n---\s*\n/, "")
    .replace(/```[\s\S]*?```/g, " ")
    .replace(/<\/?[A-Za-z][^>]*>/g, " ")
    .replace(/\{[^}]*\}/g, " ")
    .replace(/!\[[^\]]*\]\([^)]*\)/g, " ")
    .replace(/\[([^\]]*)\]\([^)]*\)/g, "$1")
    .replace(/[#*_`>|~]+/g, " ")
    .replace(/\s+/g, " ")
    .trim()
    .slice(0, maxChars);
}
