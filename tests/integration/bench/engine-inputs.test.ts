import { describe, expect, it } from "vitest";

import { machineClassFieldsSchema } from "@/content-schema/catalogue-machine-class";
import { materialFieldsSchema } from "@/content-schema/catalogue-material";
import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { setupCreateSchema } from "@/content-schema/setup-fields";
import { adaptOperation, buildAdaptInput } from "@/lib/adapt/adapt-context";
import { findVersionAdaptContext } from "@/lib/adapt/find-version-adapt-context";
import { createSetup } from "@/lib/bench/create-setup";
import { findSetup } from "@/lib/bench/list-setups";
import { machineToInput } from "@/lib/bench/machine-rows";
import { createMachine, findMachine } from "@/lib/bench/machines";
import { findMachineClassById, findMaterialById } from "@/lib/catalogue/find-catalogue-item";
import { saveMachineClass } from "@/lib/catalogue/save-machine-class";
import { saveMaterial } from "@/lib/catalogue/save-material";
import { db } from "@/lib/db/knex";
import { createBenchSheet, weakMachineFields } from "@/tests/factories/bench";
import { createVendorWithStaff, uniq } from "@/tests/factories/foundation";

// Invented test data. The new engine inputs travel from the catalogue, the customer's machine and the setup
// into adaptRecipe's input, and the server recomputes a setup with the entry capability it stores.

describe("engine inputs from stored rows", () => {
  it("stores a material's chip-load band and Kienzle constants; a row written without a band gets its group's (plastics 1.2–3 % of D)", async () => {
    const { vendor } = await createVendorWithStaff();
    const saved = await saveMaterial({
      vendorId: vendor.id,
      userId: null,
      fields: materialFieldsSchema.parse({
        slug: uniq("al"),
        name: "Aluminium",
        materialGroup: "non-ferrous",
        vcMinMpm: 150,
        vcMaxMpm: 400,
        minChipLoadMm: 0.02,
        kcNmm2: 700,
        chipLoadMinPctD: 0.6,
        chipLoadMaxPctD: 1.4,
        kc11Nmm2: 500,
        mc: 0.25,
      }),
    });
    expect(await findMaterialById({ vendorId: vendor.id, id: saved.id })).toMatchObject({
      chipLoadMinPctD: 0.6,
      chipLoadMaxPctD: 1.4,
      kc11Nmm2: 500,
      mc: 0.25,
    });

    const [raw] = await db("materials")
      .insert({
        vendor_id: vendor.id,
        slug: uniq("pc"),
        name: "PC",
        material_group: "plastics",
        vc_min_mpm: 150,
        vc_max_mpm: 300,
        min_chip_load_mm: 0.05,
        kc_nmm2: 130,
      })
      .returning(["chip_load_min_pct_d", "chip_load_max_pct_d", "kc11_nmm2"]);
    expect(raw).toEqual({ chip_load_min_pct_d: 1.2, chip_load_max_pct_d: 3, kc11_nmm2: null });
  });

  it("stores a machine class's spindle kind and rated speed", async () => {
    const { vendor } = await createVendorWithStaff();
    const saved = await saveMachineClass({
      vendorId: vendor.id,
      userId: null,
      fields: machineClassFieldsSchema.parse({
        slug: uniq("r"),
        name: "Router",
        rpmMin: 6000,
        rpmMax: 24000,
        powerKw: 2.2,
        maxFeedMmMin: 10000,
        rigidity: 0.7,
        spindleKind: "constant-torque",
        ratedRpm: 18000,
      }),
    });
    expect(await findMachineClassById({ vendorId: vendor.id, id: saved.id })).toMatchObject({
      spindleKind: "constant-torque",
      ratedRpm: 18000,
    });
  });

  it("hands every new field of the sheet, its catalogue rows and the machine to the engine", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const machine = await createMachine({
      vendorId: vendor.id,
      userId: customer.user.id,
      fields: machineFieldsSchema.parse({ ...weakMachineFields, spindleKind: "constant-torque", ratedRpm: "12000", zThrustN: "150" }),
    });
    expect(await findMachine({ vendorId: vendor.id, userId: customer.user.id, machineId: machine.id })).toMatchObject({
      spindleKind: "constant-torque",
      ratedRpm: 12000,
      zThrustN: 150,
    });
    const context = (await findVersionAdaptContext({ vendorId: vendor.id, versionId: sheet.versionId }))!;
    const input = buildAdaptInput(context, 0, machineToInput(machine), {}, { entryCapability: "plunge-only", units: "imperial" });
    // The factory's catalogue: 3.175 mm cutter with 12 mm of flute in cast acrylic (its band 1.2–3.5 % of D).
    expect(input.operation).toMatchObject({ cornerForm: "square", fluteLengthMm: 12, entry: "ramp", rampAngleDeg: 3 });
    expect(input.material).toMatchObject({
      chipLoadPctOfD: { min: 0.012, max: 0.035 },
      minChipLoadMm: 0.05,
      specificCuttingForceNmm2: 100,
    });
    expect(input.referenceMachine).toMatchObject({ rigidity: 0.8, maxFeedMmMin: 10000, maxRpm: 24000 });
    expect(input.machine).toMatchObject({ spindleKind: "constant-torque", ratedRpm: 12000, zThrustN: 150 });
    expect(input.entryCapability).toBe("plunge-only");
    expect(input.options).toMatchObject({ messageUnits: "imperial" });
  });

  it("saves the customer's CAM entry capability with the setup and recomputes with it on the server", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const machine = await createMachine({
      vendorId: vendor.id,
      userId: customer.user.id,
      fields: machineFieldsSchema.parse({ ...weakMachineFields, zThrustN: "150" }),
    });
    const input = setupCreateSchema.parse({
      versionId: sheet.versionId,
      machineId: machine.id,
      entryCapability: "plunge-only",
      result: { plungeFeedMmMin: 9999 },
    });
    const { id } = await createSetup({ vendorId: vendor.id, userId: customer.user.id, input });
    const setup = (await findSetup({ vendorId: vendor.id, userId: customer.user.id, setupId: id }))!;
    expect(setup.entryCapability).toBe("plunge-only");
    const context = (await findVersionAdaptContext({ vendorId: vendor.id, versionId: sheet.versionId }))!;
    const expected = adaptOperation(
      context,
      0,
      machineToInput(machine),
      { stickoutMm: 15 },
      { entryCapability: "plunge-only", units: "metric" },
    );
    expect(setup.result.plungeFeedMmMin).toBeCloseTo(expected.plungeFeedMmMin!, 9);
    expect(setup.result.axialDepthMm).toBeCloseTo(expected.axialDepthMm, 9);

    // A capability that is not one of the three is a field error, not a stored value.
    const bad = setupCreateSchema.safeParse({ versionId: sheet.versionId, machineId: machine.id, entryCapability: "teleport" });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]).toMatchObject({
      path: ["entryCapability"],
      message: expect.stringMatching(/straight plunge only, ramp or helix/),
    });
  });
});
