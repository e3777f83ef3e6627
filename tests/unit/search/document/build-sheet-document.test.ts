import { describe, expect, it } from "vitest";

import { buildCutterDocument, buildSheetDocument } from "@/search/document/build-sheet-document";
import { searchDocumentSchema } from "@/search/document/document-schema";
import { indexWords } from "@/search/document/index-words";
import { mdxToPlainText } from "@/search/document/plain-text";

import { sheetSource } from "./document-fixture";

describe("buildSheetDocument", () => {
  it("carries the facets from the rows and the front matter", () => {
    const src = sheetSource({ kinds: ["slotting", "profile", "slotting"] });
    const doc = buildSheetDocument(src);
    expect(searchDocumentSchema.parse(doc)).toEqual(doc);
    expect(doc.id).toBe(`sheet-${src.sheet.id}`);
    expect(doc.operations).toEqual(["slotting", "profile"]);
    expect(doc.diameterMm).toBe(3.175);
    expect(doc.flutes).toBe(1);
    expect(doc.materialGroup).toBe("plastics");
    expect(doc.publishedAt).toBe("2026-05-01T00:00:00.000Z");
  });

  it("classifies the catalogue material and adds the vocabulary's words of it and its wider material", () => {
    const doc = buildSheetDocument(sheetSource());
    expect(doc.materialKey).toBe("acrylic-cast");
    // "plexiglass" is a term of acrylic, the parent of cast acrylic; the catalogue never says it.
    expect(doc.materialNames).toEqual(expect.arrayContaining(["Cast acrylic", "PMMA", "plexiglass", "cast acrylic"]));
  });

  it("leaves the key empty for a material the vocabulary does not know", () => {
    const doc = buildSheetDocument(sheetSource({ material: { slug: "unobtainium", name: "Unobtainium foam", group: "plastics" } }));
    expect(doc.materialKey).toBeNull();
    expect(doc.materialNames).toEqual(["Unobtainium foam"]);
  });

  it("ignores unknown operation kinds and malformed front matter instead of failing", () => {
    const src = sheetSource();
    src.version.frontMatter = { operations: [{ kind: "teleport" }, null, { kind: "ramp" }], tags: [3, "x"] };
    const doc = buildSheetDocument(src);
    expect(doc.operations).toEqual(["ramp"]);
    expect(doc.tags).toEqual(["x"]);
    expect(buildSheetDocument({ ...src, version: { ...src.version, frontMatter: null } }).operations).toEqual([]);
  });

  it("reads the operation key stored before the rename as the current one", () => {
    const src = sheetSource();
    src.version.frontMatter = { operations: [{ kind: "adaptive" }, { kind: "slotting" }] };
    expect(buildSheetDocument(src).operations).toEqual(["constant-engagement", "slotting"]);
  });

  it("indexes a cutter by SKU", () => {
    const src = sheetSource();
    const doc = buildCutterDocument(src.vendorId, src.cutter);
    expect(doc).toMatchObject({ kind: "cutter", slug: "T-SF-3175", cutterSku: "T-SF-3175", sheetId: null, operations: [] });
    expect(searchDocumentSchema.safeParse(doc).success).toBe(true);
  });
});

describe("index text", () => {
  it("strips MDX to words", () => {
    expect(mdxToPlainText('---\na: 1\n---\n## Hold *flat*\n\n<Caution kind="dust">Run **extraction**</Caution>\n{1+1}')).toBe(
      "Hold flat Run extraction",
    );
  });

  it("lists the short fields' words once, folded, with the operations' trade words", () => {
    const words = indexWords(buildSheetDocument(sheetSource({ title: "Acrylique coulé, fraise" }))).split(" ");
    expect(words).toContain("coule");
    expect(words).toContain("contour"); // a trade word for profile
    expect(new Set(words).size).toBe(words.length);
  });
});
