import { describe, expect, it } from "vitest";

import { machineClassFieldsSchema } from "@/content-schema/catalogue-machine-class";
import { materialFieldsSchema } from "@/content-schema/catalogue-material";
import { machineFieldsSchema } from "@/content-schema/machine-fields";

const acrylic = {
  slug: "cast-acrylic",
  name: "Cast acrylic",
  materialGroup: "plastics",
  vcMinMpm: "150",
  vcMaxMpm: "300",
  minChipLoadMm: "0.05",
  kcNmm2: "120",
};
const aluminium = { ...acrylic, slug: "al", name: "Aluminium", materialGroup: "non-ferrous", kcNmm2: "700" };
const errorsOf = (result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  Object.fromEntries((result.error?.issues ?? []).map((i) => [String(i.path[0]), i.message]));

describe("material chip-load band and Kienzle constants (form and CSV text)", () => {
  it("takes the group's typical band when left blank (common practice: plastics 1.2–3 % of D, aluminium 0.5–1.5 % of D)", () => {
    expect(materialFieldsSchema.parse({ ...acrylic, chipLoadMinPctD: "", chipLoadMaxPctD: "" })).toMatchObject({
      chipLoadMinPctD: 1.2,
      chipLoadMaxPctD: 3,
    });
    const al = materialFieldsSchema.parse(aluminium);
    expect(al).toMatchObject({ chipLoadMinPctD: 0.5, chipLoadMaxPctD: 1.5 });
    expect([al.kc11Nmm2, al.mc]).toEqual([undefined, undefined]);
  });

  it("reads a typed band and kc1.1 + mc, with a decimal comma", () => {
    expect(
      materialFieldsSchema.parse({ ...aluminium, chipLoadMinPctD: "0,6", chipLoadMaxPctD: "1.4", kc11Nmm2: "500", mc: "0.25" }),
    ).toMatchObject({ chipLoadMinPctD: 0.6, chipLoadMaxPctD: 1.4, kc11Nmm2: 500, mc: 0.25 });
  });

  it("names the field: a band upside down, mc without kc1.1, mc of 1 or more, a band above 20 % of D", () => {
    expect(errorsOf(materialFieldsSchema.safeParse({ ...acrylic, chipLoadMinPctD: "3", chipLoadMaxPctD: "1.2" }))).toEqual({
      chipLoadMaxPctD: "The highest chip load cannot be below the lowest.",
    });
    expect(errorsOf(materialFieldsSchema.safeParse({ ...acrylic, mc: "0.25" }))).toEqual({
      kc11Nmm2: "mc needs kc1.1: give both, or neither.",
    });
    expect(errorsOf(materialFieldsSchema.safeParse({ ...acrylic, kc11Nmm2: "500", mc: "1.2" })).mc).toMatch(/between 0 and 1/);
    expect(errorsOf(materialFieldsSchema.safeParse({ ...acrylic, chipLoadMaxPctD: "25" })).chipLoadMaxPctD).toMatch(/20 % of D/);
    expect(errorsOf(materialFieldsSchema.safeParse({ ...acrylic, kc11Nmm2: "lots" })).kc11Nmm2).toBe("kc1.1 must be a number.");
  });
});

describe("spindle kind and rated speed (machine class and Bench machine)", () => {
  const machineClass = {
    slug: "light-router",
    name: "Light router",
    rpmMin: "8000",
    rpmMax: "24000",
    powerKw: "0.8",
    maxFeedMmMin: "5000",
    rigidity: "0.4",
  };
  const machine = {
    name: "Garage router",
    rpmMin: "8000",
    rpmMax: "24000",
    powerKw: "0.8",
    maxFeedMmMin: "3000 mm/min",
    rigidity: "light",
  };

  it("defaults to a VFD spindle holding torque up to its top speed", () => {
    const k = machineClassFieldsSchema.parse(machineClass);
    expect([k.spindleKind, k.ratedRpm, k.zThrustN]).toEqual(["constant-torque", undefined, undefined]);
    const m = machineFieldsSchema.parse({ ...machine, spindleKind: "" });
    expect([m.spindleKind, m.ratedRpm]).toEqual(["constant-torque", undefined]);
  });

  it("keeps a constant-power spindle and a rated speed", () => {
    expect(machineClassFieldsSchema.parse({ ...machineClass, spindleKind: "constant-power", ratedRpm: "18000" })).toMatchObject({
      spindleKind: "constant-power",
      ratedRpm: 18000,
    });
    expect(machineFieldsSchema.parse({ ...machine, spindleKind: "constant-torque", ratedRpm: "18000" })).toMatchObject({ ratedRpm: 18000 });
  });

  it("refuses a rated speed above the top speed and an unknown spindle kind, naming the field", () => {
    expect(errorsOf(machineClassFieldsSchema.safeParse({ ...machineClass, ratedRpm: "30000" }))).toEqual({
      ratedRpm: "The rated speed cannot be above the highest spindle speed.",
    });
    expect(errorsOf(machineFieldsSchema.safeParse({ ...machine, ratedRpm: "30000" }))).toEqual({
      ratedRpm: "The rated speed cannot be above the highest spindle speed.",
    });
    expect(errorsOf(machineFieldsSchema.safeParse({ ...machine, spindleKind: "turbo" })).spindleKind).toMatch(
      /how the spindle delivers power/,
    );
  });
});
