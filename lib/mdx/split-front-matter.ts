export type SplitSource =
  | {
      ok: true;
      /** YAML text between the `---` lines. */
      frontMatter: string;
      /** 1-based line of the file where the YAML text starts. */
      frontMatterLine: number;
      /** MDX text after the closing `---` line. */
      body: string;
      /** 1-based line of the file where the body starts. */
      bodyLine: number;
    }
  | { ok: false; line: number; message: string };

const FENCE = /^---[ \t]*$/;

/** Splits a sheet source into YAML front matter and MDX body, keeping line numbers. */
export function splitFrontMatter(source: string): SplitSource {
  const lines = source.replace(/^\uFEFF/, "").split(/\r?\n/);
  if (!FENCE.test(lines[0] ?? "")) {
    return { ok: false, line: 1, message: "A sheet must start with front matter: a line `---`, the YAML fields, then another `---`." };
  }
  const close = lines.findIndex((line, i) => i > 0 && FENCE.test(line));
  if (close === -1) {
    return { ok: false, line: lines.length, message: "The front matter is not closed: add a line `---` after the YAML fields." };
  }
  return {
    ok: true,
    frontMatter: lines.slice(1, close).join("\n"),
    frontMatterLine: 2,
    body: lines.slice(close + 1).join("\n"),
    bodyLine: close + 2,
  };
}
