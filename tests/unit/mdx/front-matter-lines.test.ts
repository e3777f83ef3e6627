import { describe, expect, it } from "vitest";

import { validateSheetSource } from "@/lib/mdx/validate-sheet-source";
import { buildSheetSource, frontMatterInput, lineOf, operationInput } from "@/tests/factories/sheet-source";

function errorsOf(source: string) {
  const result = validateSheetSource(source);
  expect(result.ok).toBe(false);
  return result.issues.filter((issue) => issue.severity === "error");
}

describe("front-matter errors name their YAML line in the whole file", () => {
  it("vf: fast is reported on the vf line", () => {
    const source = buildSheetSource({ frontMatter: { operations: [operationInput({ vf: "fast" })] } });
    expect(errorsOf(source)).toEqual([
      expect.objectContaining({ line: lineOf(source, "vf: fast"), path: "operations[0].vf", message: expect.stringMatching(/feed rate/) }),
    ]);
  });

  it("an unknown key such as fedd is reported on its own line", () => {
    const source = buildSheetSource({ frontMatter: { operations: [operationInput({ fedd: "1800 mm/min" })] } });
    expect(errorsOf(source)).toEqual([
      expect.objectContaining({
        line: lineOf(source, "fedd:"),
        path: "operations[0].fedd",
        message: expect.stringMatching(/Unknown field “fedd”/),
      }),
    ]);
  });

  it("a second operation's error points into the second operation", () => {
    const second = operationInput({ kind: "profile", ap: "deep" });
    const source = buildSheetSource({ frontMatter: { operations: [operationInput(), second] } });
    const secondItem = lineOf(source, "- kind: profile");
    expect(errorsOf(source)).toEqual([expect.objectContaining({ line: lineOf(source, "ap: deep", secondItem), path: "operations[1].ap" })]);
  });

  it("a missing field of an operation is reported on that operation's first line", () => {
    const { vf: _vf, ...withoutVf } = operationInput({ kind: "pocket" });
    const source = buildSheetSource({ frontMatter: { operations: [withoutVf] } });
    expect(errorsOf(source)).toEqual([
      expect.objectContaining({
        line: lineOf(source, "- kind: pocket"),
        path: "operations[0].vf",
        message: "operations[0].vf is required.",
      }),
    ]);
  });

  it("no operations at all is reported on the operations line", () => {
    const source = buildSheetSource({ frontMatter: { operations: [] } });
    expect(errorsOf(source)).toEqual([
      expect.objectContaining({ line: lineOf(source, "operations:"), message: expect.stringMatching(/at least one operation/) }),
    ]);
  });

  it("a missing operations key is reported at the start of the front matter", () => {
    const source = buildSheetSource({ frontMatter: { operations: undefined } });
    expect(errorsOf(source)).toEqual([expect.objectContaining({ line: 2, path: "operations", message: "operations is required." })]);
  });

  it("a misspelt top-level key is reported on its line", () => {
    const source = buildSheetSource({ frontMatter: { tagz: ["acrylic"] } });
    expect(errorsOf(source)).toEqual([
      expect.objectContaining({ line: lineOf(source, "tagz:"), message: expect.stringMatching(/“tagz”/) }),
    ]);
  });

  it("a number without its unit is refused on its line", () => {
    const source = buildSheetSource({ frontMatter: { operations: [operationInput({ n: 18000 })] } });
    expect(errorsOf(source)).toEqual([
      expect.objectContaining({ line: lineOf(source, "n: 18000"), message: expect.stringMatching(/18000 rpm/) }),
    ]);
  });

  it("YAML syntax errors carry their line in the file, not in the YAML block", () => {
    const yaml = "title: Sheet\nsummary: ok\noperations:\n\t- kind: slotting";
    const source = buildSheetSource({ yaml });
    const [error] = errorsOf(source);
    expect(error.message).toBe("This line is indented with a tab; indent with spaces instead.");
    expect(error.message).not.toMatch(/at line/);
    expect(error.line).toBe(lineOf(source, "\t- kind"));
  });

  it("a duplicated key is a YAML error on the second occurrence", () => {
    const source = buildSheetSource({ yaml: `${frontMatterYaml()}\ncutter: OTHER-SKU` });
    expect(errorsOf(source)[0]).toEqual(expect.objectContaining({ line: lineOf(source, "cutter: OTHER-SKU") }));
  });

  it("keeps line numbers with Windows line endings", () => {
    const source = buildSheetSource({ frontMatter: { operations: [operationInput({ vf: "fast" })] } }).replace(/\n/g, "\r\n");
    expect(errorsOf(source)[0].line).toBe(lineOf(source, "vf: fast"));
  });

  it("reports front-matter and body errors together, each on its line", () => {
    const source = buildSheetSource({ frontMatter: { operations: [operationInput({ vf: "fast" })] }, body: "Prose.\n\n<Unknown />\n" });
    expect(errorsOf(source).map((e) => e.line)).toEqual([lineOf(source, "vf: fast"), lineOf(source, "<Unknown />")]);
  });
});

describe("front matter delimiters", () => {
  it("requires front matter at the top", () => {
    expect(errorsOf("# Just prose\n")).toEqual([
      expect.objectContaining({ line: 1, message: expect.stringMatching(/start with front matter/) }),
    ]);
  });

  it("requires the closing --- line", () => {
    expect(errorsOf("---\ntitle: x\n")[0].message).toMatch(/not closed/);
  });

  it("returns the parsed front matter and the body on success", () => {
    const result = validateSheetSource(buildSheetSource({ body: "Body text.\n" }));
    expect(result.ok && result.frontMatter.cutter).toBe(frontMatterInput().cutter);
    expect(result.body).toBe("Body text.\n");
  });
});

function frontMatterYaml(): string {
  const source = buildSheetSource();
  return source.slice(4, source.indexOf("\n---\n"));
}
