/**
 * Matching key of a word or phrase: lower case, no accents, and no spaces, hyphens,
 * slashes, underscores or quotes, so `ball nose`, `ball-nose` and `Ballnose` are one key.
 */
export function termKey(text: string): string {
  return text
    .normalize("NFKD")
    .toLowerCase()
    .replace(/[\u0300-\u036f]/g, "")
    .replace(/[\s\-_/'"]+/g, "");
}

/** Number of words a term spans when typed with spaces: the widest window the matcher must try. */
export const termWordCount = (term: string) => term.split(/[\s\-/]+/).filter(Boolean).length;
