/** Longer queries are cut: a search box query is a few words, and the limits bound the parser's work. */
export const MAX_QUERY_CHARS = 200;
export const MAX_QUERY_TOKENS = 20;
// Raw input is cut first, so a huge paste costs no more than this before normalising.
const RAW_LIMIT = MAX_QUERY_CHARS * 5;

const VULGAR: Record<string, string> = { "¼": "1/4", "½": "1/2", "¾": "3/4", "⅛": "1/8", "⅜": "3/8", "⅝": "5/8", "⅞": "7/8" };

/**
 * Query text safe to parse and to show again: accents removed, vulgar fractions, primes and
 * curly quotes written plainly, whitespace folded, control and format characters dropped.
 */
export function sanitiseQuery(input: unknown): { query: string; truncated: boolean } {
  if (typeof input !== "string") return { query: "", truncated: false };
  let s = input.slice(0, RAW_LIMIT);
  // Before NFKD, which would turn "1¼" into "11⁄4".
  s = s.replace(/(\d?)([¼½¾⅛⅜⅝⅞])/g, (_, whole: string, f: string) => ` ${whole} ${VULGAR[f]}`);
  s = s
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .normalize("NFC");
  s = s
    .replace(/[\u2044\u2215]/g, "/")
    .replace(/\u2032\u2032|''|[\u2033\u201c\u201d\u201e]/g, '"')
    .replace(/[\u2032\u2018\u2019]/g, "'")
    .replace(/\u2300/g, "ø")
    .replace(/[\s\p{Z}]+/gu, " ")
    .replace(/[\p{Cc}\p{Cf}\p{Cs}\p{Co}]/gu, "")
    .replace(/ {2,}/g, " ")
    .trim();
  const chars = Array.from(s);
  if (chars.length <= MAX_QUERY_CHARS && input.length <= RAW_LIMIT) return { query: s, truncated: false };
  let cut = chars.slice(0, MAX_QUERY_CHARS).join("");
  // Drop a word cut in half.
  if (chars.length > MAX_QUERY_CHARS && chars[MAX_QUERY_CHARS] !== " " && cut.includes(" ")) cut = cut.slice(0, cut.lastIndexOf(" "));
  return { query: cut.trim(), truncated: true };
}
