import { describe, expect, it } from "vitest";

import { parseQuery } from "@/search/parse";

describe("parseQuery materials", () => {
  it.each([
    ["acrylic", "acrylic"],
    ["PMMA", "acrylic"],
    ["plexiglass", "acrylic"],
    ["Plexi", "acrylic"],
    ["cast acrylic", "acrylic-cast"],
    ["extruded acrylic", "acrylic-extruded"],
    ["HDPE", "hdpe"],
    ["polyethylene", "hdpe"],
    ["polycarbonate", "polycarbonate"],
    ["PC", "polycarbonate"],
    ["aluminium", "aluminium"],
    ["aluminum", "aluminium"],
    ["alu", "aluminium"],
    ["ALUMINIUM", "aluminium"],
    ["6061", "aluminium-6061"],
    ["6061-T6", "aluminium-6061"],
    ["aluminum 6061 T6", "aluminium-6061"],
    ["6082", "aluminium-6082"],
    ["5083", "aluminium-5083"],
    ["MDF", "mdf"],
    ["plywood", "plywood"],
    ["ply", "plywood"],
    ["hardwood", "hardwood"],
    ["oak", "hardwood"],
    ["maple", "hardwood"],
    ["walnut", "hardwood"],
    ["carbon fibre", "cfrp"],
    ["carbon fiber", "cfrp"],
    ["carbon-fiber", "cfrp"],
    ["CFRP", "cfrp"],
    ["G10", "g10"],
    ["FR4", "g10"],
    ["FR-4", "g10"],
    ["G10/FR4", "g10"],
  ])("maps %s to %s", (input, key) => {
    const q = parseQuery(input);
    expect(q.materials).toEqual([key]);
    expect(q.text).toBe("");
  });

  it("is accent insensitive", () => {
    expect(parseQuery("alumínium").materials).toEqual(["aluminium"]);
    expect(parseQuery("ACRÝLIC").materials).toEqual(["acrylic"]);
  });

  it("matches the longest phrase first", () => {
    expect(parseQuery("cast acrylic").materials).toEqual(["acrylic-cast"]);
    expect(parseQuery("carbon steel").materials).toEqual(["steel"]);
    expect(parseQuery("carbon").materials).toEqual(["cfrp"]);
  });

  it("shows the word the user typed on a material chip", () => {
    expect(parseQuery("pmma").chips).toEqual([{ kind: "material", label: "PMMA", value: "acrylic", sourceText: "pmma" }]);
  });

  it("reads group words as material groups", () => {
    expect(parseQuery("plastics").materialGroups).toEqual(["plastics"]);
    expect(parseQuery("non-ferrous").materialGroups).toEqual(["non-ferrous"]);
    expect(parseQuery("wood").materialGroups).toEqual(["wood"]);
    expect(parseQuery("acrylic").materialGroups).toEqual([]);
  });

  it("leaves a misspelt material in the free text for the typo-tolerant engine", () => {
    const q = parseQuery("alumnium slot");
    expect(q.materials).toEqual([]);
    expect(q.text).toBe("alumnium");
    expect(q.operations).toEqual(["slotting"]);
  });
});

describe("parseQuery operations, corner forms and geometry", () => {
  it.each([
    ["slot", "slotting"],
    ["slotting", "slotting"],
    ["groove", "slotting"],
    ["pocket", "pocket"],
    ["pocketing", "pocket"],
    ["clearing", "pocket"],
    ["profile", "profile"],
    ["contour", "profile"],
    ["cutout", "profile"],
    ["cut-out", "profile"],
    ["outline", "profile"],
    ["finish", "finishing"],
    ["finishing", "finishing"],
    ["ramp", "ramp"],
    ["helix", "helical"],
    ["helical", "helical"],
    ["trochoidal", "constant-engagement"],
    ["adaptive", "constant-engagement"],
    ["HSM", "constant-engagement"],
    ["dynamic", "constant-engagement"],
    ["plunge", "plunge"],
    ["drill", "drilling"],
    ["drilling", "drilling"],
  ])("maps %s to the operation %s", (input, kind) => {
    expect(parseQuery(input).operations).toEqual([kind]);
  });

  it("labels an operation chip with the trade name, not the typed word", () => {
    expect(parseQuery("slot").chips[0]).toEqual({ kind: "operation", label: "slotting", value: "slotting", sourceText: "slot" });
  });

  it.each([
    ["ball", "ball"],
    ["ballnose", "ball"],
    ["ball-nose", "ball"],
    ["ball nose", "ball"],
    ["bullnose", "ball"],
    ["bull", "corner-radius"],
    ["corner radius", "corner-radius"],
    ["radiused", "corner-radius"],
    ["square", "square"],
    ["flat", "square"],
  ])("maps %s to the corner form %s", (input, form) => {
    expect(parseQuery(input).cornerForms).toEqual([form]);
  });

  it.each([
    ["upcut", "upcut"],
    ["up-cut", "upcut"],
    ["up cut", "upcut"],
    ["downcut", "downcut"],
    ["down-cut", "downcut"],
    ["compression", "compression"],
  ])("maps %s to the geometry %s", (input, geometry) => {
    const q = parseQuery(input);
    expect(q.geometry).toEqual([geometry]);
    expect(q.flutes).toBeUndefined();
  });
});
