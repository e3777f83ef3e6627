import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { z } from "zod";

import { DeadlineRunner } from "@/tests/support/deadline-runner";
import { hostileCorpus } from "@/tests/support/hostile-corpus";

// Untrusted Markdown (tickets, replies, notes, inbound mail, notification mail) must render in bounded time without
// a stack overflow. Each render runs on a worker thread with a deadline, so a parser that loops forever fails the
// test instead of hanging the suite. The deadline is a hang guard, not a speed target: it is generous for a busy CI.
// The hostile corpus holds inputs at the size and delimiter limits whose parse time grew much faster than their
// length (setext underlines, lazy quote continuations, thousands of short lines took seconds); they get a deadline
// still many times a bounded render (well under 100 ms on an idle core) yet far below those seconds.
const DEADLINE_MS = 30_000;
const CORPUS_DEADLINE_MS = 1_500;
const ENTRY = "tests/support/render-markdown-entry.tsx";

const GENERATED: Array<[string, string]> = [
  ["heading + U+2028", "# a\u2028b"],
  ["heading + U+2029", "# a\u2029b"],
  ["5,000 nested quotes", `${">".repeat(5_000)} a`],
  ["5,000 nested quotes with spaces", `${"> ".repeat(5_000)}a`],
  ["5,000 nested bullets", `${"- ".repeat(5_000)}a`],
  ["5,000 nested ordered items", `${"1. ".repeat(5_000)}a`],
  ["quotes and bullets alternating", `${"> - ".repeat(2_500)}a`],
  ["lists nested by indentation", Array.from({ length: 140 }, (_, i) => `${" ".repeat(i * 2)}- a`).join("\n")],
  [
    "quotes nested line by line",
    Array.from({ length: 2_000 }, (_, i) => `${">".repeat(i)} a`)
      .join("\n")
      .slice(0, 20_000),
  ],
  ["5,000 nested footnote definitions", `${"[^a]: ".repeat(3_000)}x`],
  ["a 20,000-character line", "x".repeat(20_000)],
  ["a 20,000-character line of words", "word ".repeat(4_000)],
  ["a 20,000-character line of backticks", "`".repeat(20_000)],
  ["emphasis bomb", `${"*".repeat(9_999)}a${"*".repeat(9_999)}`],
  ["emphasis runs", `${"*a ".repeat(3_000)}b${"*".repeat(3_000)}`],
  ["image bomb", `${"![".repeat(3_000)}a${"](b)".repeat(3_000)}`],
  ["link bomb", `${"[".repeat(5_000)}a${"](b)".repeat(3_000)}`],
  ["unclosed links", "[a](".repeat(5_000)],
  ["wide table", `${"|a".repeat(2_000)}|\n${"|-".repeat(2_000)}|\n${"|a".repeat(2_000)}|`],
  ["many reference definitions", Array.from({ length: 600 }, (_, i) => `[r${i}]: http://x.example/${i}`).join("\n")],
  ["angle brackets", "<a".repeat(10_000)],
  ["character references", "&#".repeat(10_000)],
  ["autolink literals", "www.a.example/".repeat(1_400)],
  ["100,000 characters", "All good. ".repeat(10_000)],
];

const CASES: Array<[string, string, number]> = [
  ...GENERATED.map(([name, text]): [string, string, number] => [name, text, DEADLINE_MS]),
  ...hostileCorpus("markdown").map(([name, text]): [string, string, number] => [`corpus: ${name}`, text, CORPUS_DEADLINE_MS]),
];

// No element that runs or loads anything, no event handler, and every link http(s) or mailto. Only real tags are
// inspected: raw HTML a user typed is shown as escaped text and may mention anything.
function expectSafeHtml(html: string) {
  for (const [tag] of html.matchAll(/<[a-z][^>]*>/gi)) {
    expect(tag).not.toMatch(/^<(script|img|iframe|svg|style|object|embed|input|form|link|meta|base)\b/i);
    expect(tag).not.toMatch(/\son[a-z]+\s*=/i);
    for (const [, url] of tag.matchAll(/\s(?:href|src|action|formaction|cite)="([^"]*)"/gi)) expect(url).toMatch(/^(https?:|mailto:)/);
  }
}

describe.each([
  ["the page component", "renderTicketMarkdown", (out: string) => out],
  ["the notification mail", "renderMailParts", (out: string) => z.object({ html: z.string() }).parse(JSON.parse(out)).html],
])("untrusted Markdown through %s", (_, exportName, htmlOf) => {
  const runner = new DeadlineRunner(ENTRY, exportName);
  beforeAll(async () => {
    await runner.run("warm up", 120_000);
  }, 130_000);
  afterAll(() => runner.close());

  it.each(CASES)(
    "%s: finishes and stays safe",
    async (_name, source, deadline) => {
      const result = await runner.run(source, deadline);
      expect(result.status, result.status === "threw" ? result.error : "").toBe("done");
      if (result.status === "done") expectSafeHtml(htmlOf(result.output));
    },
    DEADLINE_MS + 5_000,
  );
});
