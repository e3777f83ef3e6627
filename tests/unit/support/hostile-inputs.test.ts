import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { DeadlineRunner } from "@/tests/support/deadline-runner";
import { hostileCorpus } from "@/tests/support/hostile-corpus";

// Every parser that takes untrusted text, run over its hostile corpus in tests/fixtures/hostile/ on a worker thread
// with a deadline: each must return (a result or a clear list of problems), never throw and never hang. The deadline
// is a hang guard for a busy CI, not a speed target. (Markdown has its own test: markdown-bounded.test.ts; JSON
// bodies go through a real route handler: tests/integration/http/hostile-json.test.ts.)
const DEADLINE_MS = 30_000;
const ENTRY = "tests/support/hostile-entry.ts";

const searchQueries = hostileCorpus("search").flatMap(([file, text]) =>
  text
    .split("\n")
    .filter(Boolean)
    .map((line, i): [string, string] => [`${file}:${i + 1}`, line]),
);

describe.each([
  ["MDX sheet source", "validateSheet", hostileCorpus("mdx"), (out: unknown) => expect(out).toMatchObject({ issues: expect.any(Array) })],
  [
    "cutter CSV import",
    "checkCsv",
    hostileCorpus("csv"),
    (out: unknown) => expect(out).toMatchObject({ fileErrors: expect.any(Array), rows: expect.any(Array) }),
  ],
  ["search query", "parseSearch", searchQueries, (out: unknown) => expect(out).toMatchObject({ text: expect.any(String) })],
])("hostile %s", (_kind, exportName, cases, check) => {
  const runner = new DeadlineRunner(ENTRY, exportName);
  beforeAll(async () => {
    await runner.run("", 120_000);
  }, 130_000);
  afterAll(() => runner.close());

  it.each(cases)(
    "%s: answers in bounded time without throwing",
    async (_name, input) => {
      const result = await runner.run(input, DEADLINE_MS);
      expect(result.status, result.status === "threw" ? result.error : "").toBe("done");
      if (result.status === "done") check(JSON.parse(result.output));
    },
    DEADLINE_MS + 5_000,
  );
});

describe("the MDX corpus", () => {
  it("reports script elements and imports instead of accepting them", async () => {
    const runner = new DeadlineRunner(ENTRY, "validateSheet");
    try {
      for (const [name, source] of hostileCorpus("mdx").filter(([n]) => /script|imports/.test(n))) {
        const result = await runner.run(source, 120_000);
        expect(result.status, name).toBe("done");
        if (result.status === "done") expect(JSON.parse(result.output).ok, name).toBe(false);
      }
    } finally {
      await runner.close();
    }
  }, 130_000);
});
