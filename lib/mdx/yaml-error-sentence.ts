// The YAML parser's errors as sentences an engineer can act on; the line is given beside each issue.
// Codes from the `yaml` package (YAMLError.code).
const SENTENCES: Record<string, (message: string) => string> = {
  TAB_AS_INDENT: () => "This line is indented with a tab; indent with spaces instead.",
  DUPLICATE_KEY: () => "This field is already given above; keep only one of the two.",
  MULTILINE_IMPLICIT_KEY: () =>
    "A line here is not a field: write the field name, a colon and a space, then the value (like “vf: 1800 mm/min”).",
  BLOCK_AS_IMPLICIT_KEY: () =>
    "A value here contains “: ” or is indented too far; put the value in quotes, or line the field up with the ones above it.",
  MISSING_CHAR: (m) =>
    /quote/i.test(m)
      ? "A quoted value is not closed; end it with the same quote mark on this line."
      : "A field name here has no value; add a colon, a space and the value.",
  BAD_SCALAR_START: (m) =>
    `A value cannot start with “${/character (\S+)/.exec(m)?.[1] ?? "this character"}”; put the whole value in quotes.`,
  BAD_INDENT: (m) =>
    /flow sequence/i.test(m)
      ? "A list in brackets is not closed; end it with “]” on the same line."
      : "The indentation is off here; line this field up with the others at its level.",
  UNEXPECTED_TOKEN: () => "Something here does not belong in the front matter; look for a stray character or a missing colon.",
  BAD_DQ_ESCAPE: () => "A backslash in double quotes starts an escape that YAML does not know; use single quotes or double the backslash.",
};

/** A YAML parse error as one sentence; unknown codes keep the parser's words, cleaned up. */
export function yamlErrorSentence(code: string, message: string): string {
  const first = message
    .split("\n")[0]
    .replace(/ at line \d+, column \d+:?$/, "")
    .trim();
  const sentence = SENTENCES[code]?.(first);
  if (sentence) return sentence;
  const cleaned = first.charAt(0).toUpperCase() + first.slice(1);
  return `The front matter cannot be read here: ${cleaned}${/[.!?]$/.test(cleaned) ? "" : "."}`;
}
