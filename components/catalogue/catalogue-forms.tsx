"use client";

import {
  cornerFormLabels,
  cornerForms,
  cutterFieldsSchema,
  cutterGeometries,
  geometryLabels,
  toolMaterials,
} from "@/content-schema/catalogue-cutter";
import { machineClassFieldsSchema } from "@/content-schema/catalogue-machine-class";
import { materialFieldsSchema, materialGroupLabels, materialGroups } from "@/content-schema/catalogue-material";
import { SPINDLE_KIND_KEYS, spindleKindLabels } from "@/content-schema/spindle-kind";
import type { ActionState } from "@/lib/actions/action-state";

import { CatalogueForm, type FieldSpec } from "./catalogue-form";

type Action = (state: ActionState, input: Record<string, unknown>) => Promise<ActionState>;
type Props = { vendorSlug: string; action: Action; id?: string; defaultValues?: Record<string, unknown> };

const labelled = <T extends string>(values: readonly T[], labels: Record<T, string>) => values.map((v) => [v, labels[v]] as const);

const CUTTER_FIELDS: FieldSpec[] = [
  { name: "sku", label: "SKU" },
  { name: "name", label: "Name" },
  { name: "diameterMm", label: "DC, cutting diameter (mm)", type: "number" },
  { name: "flutes", label: "ZEFP, number of flutes", type: "number" },
  { name: "fluteLengthMm", label: "APMX, flute length (mm)", type: "number" },
  { name: "overallLengthMm", label: "OAL, overall length (mm)", type: "number" },
  { name: "shankMm", label: "DMM, shank diameter (mm)", type: "number" },
  { name: "cornerForm", label: "Corner form", type: "select", options: labelled(cornerForms, cornerFormLabels) },
  {
    name: "cornerRadiusMm",
    label: "RE, corner radius (mm)",
    type: "number",
    hint: "Required for a corner-radius cutter; for a ball nose, half of DC.",
  },
  { name: "helixDeg", label: "Helix angle (°)", type: "number" },
  {
    name: "toolMaterial",
    label: "Tool material",
    type: "select",
    options: toolMaterials.map((m) => [m, m === "hss" ? "HSS" : "Carbide"] as const),
  },
  { name: "coating", label: "Coating" },
  { name: "geometry", label: "Geometry", type: "select", options: labelled(cutterGeometries, geometryLabels) },
  { name: "notes", label: "Notes", type: "textarea" },
];

export function CutterForm({ vendorSlug, action, id, defaultValues }: Props) {
  return (
    <CatalogueForm
      schema={cutterFieldsSchema}
      fields={CUTTER_FIELDS}
      action={action}
      hidden={{ vendor: vendorSlug, ...(id ? { id } : {}) }}
      defaultValues={defaultValues ?? { cornerForm: "square", toolMaterial: "carbide", geometry: "straight", notes: "" }}
      submitLabel={id ? "Save cutter" : "Add cutter"}
      doneHref={(v) => `/${vendorSlug}/drafting/cutters/${encodeURIComponent(String(v.sku))}`}
    />
  );
}

const MATERIAL_FIELDS: FieldSpec[] = [
  { name: "name", label: "Name" },
  { name: "slug", label: "Slug", hint: "Used in sheet front matter, e.g. cast-acrylic." },
  { name: "materialGroup", label: "Group", type: "select", options: labelled(materialGroups, materialGroupLabels) },
  { name: "kcNmm2", label: "kc, specific cutting force (N/mm²)", type: "number" },
  { name: "vcMinMpm", label: "Lowest vc (m/min)", type: "number" },
  { name: "vcMaxMpm", label: "Highest vc (m/min)", type: "number" },
  {
    name: "minChipLoadMm",
    label: "Minimum chip load fz (mm)",
    type: "number",
    hint: "Absolute floor of the band, for any cutter: below it the edge rubs (plastics melt).",
  },
  {
    name: "chipLoadMinPctD",
    label: "Chip load band, lowest (% of D)",
    type: "number",
    hint: "Lowest chip per tooth (hex) as a share of the cutter diameter. Empty: the group's typical value (plastics and woods 1.2 %, aluminium and composites 0.5 %).",
  },
  {
    name: "chipLoadMaxPctD",
    label: "Chip load band, highest (% of D)",
    type: "number",
    hint: "Above it a small cutter breaks. Empty: plastics and woods 3 %, aluminium and composites 1.5 %.",
  },
  {
    name: "kc11Nmm2",
    label: "kc1.1, Kienzle specific cutting force at h = 1 mm (N/mm²)",
    type: "number",
    hint: "Optional. With mc, the force rises as the chip thins; without it, kc above is used at every chip thickness.",
  },
  { name: "mc", label: "mc, Kienzle exponent", type: "number", hint: "Optional, typically 0.2–0.4; needs kc1.1." },
  { name: "synonyms", label: "Synonyms", hint: "Comma-separated, e.g. PMMA, plexi." },
  {
    name: "cautions",
    label: "Cautions",
    type: "textarea",
    hint: "One per line; start with a kind to file it, e.g. “melting: Keep the feed up.” (kinds: fire, melting, dust, eye, hearing, clamping).",
  },
  { name: "notes", label: "Notes", type: "textarea" },
];

export function MaterialForm({ vendorSlug, action, id, defaultValues }: Props) {
  return (
    <CatalogueForm
      schema={materialFieldsSchema}
      fields={MATERIAL_FIELDS}
      action={action}
      hidden={{ vendor: vendorSlug, ...(id ? { id } : {}) }}
      defaultValues={defaultValues ?? { materialGroup: "plastics", notes: "", synonyms: "", cautions: "" }}
      submitLabel={id ? "Save material" : "Add material"}
      doneHref={(v) => `/${vendorSlug}/drafting/materials/${String(v.slug)}`}
    />
  );
}

const MACHINE_FIELDS: FieldSpec[] = [
  { name: "name", label: "Name" },
  { name: "slug", label: "Slug", hint: "Used in sheet front matter, e.g. light-router." },
  { name: "rpmMin", label: "Lowest spindle speed (rpm)", type: "number" },
  { name: "rpmMax", label: "Highest spindle speed (rpm)", type: "number" },
  { name: "powerKw", label: "Spindle power (kW)", type: "number" },
  { name: "maxFeedMmMin", label: "Highest feed (mm/min)", type: "number" },
  { name: "rigidity", label: "Rigidity (0 to 1)", type: "number", hint: "1 is the stiffest class, e.g. a machining centre." },
  {
    name: "zThrustN",
    label: "Z thrust limit (N)",
    type: "number",
    hint: "How hard the Z axis can push a cutter down; the plunge feed is capped by it. Empty: 150 N light, 400 N medium, 1500 N rigid (by rigidity).",
  },
  { name: "spindleKind", label: "Spindle drive", type: "select", options: labelled(SPINDLE_KIND_KEYS, spindleKindLabels) },
  {
    name: "ratedRpm",
    label: "Rated speed (rpm)",
    type: "number",
    hint: "Where a VFD spindle reaches its rated power; below it the power falls with speed. Empty: the highest speed.",
  },
  { name: "description", label: "Description", type: "textarea" },
];

export function MachineClassForm({ vendorSlug, action, id, defaultValues }: Props) {
  return (
    <CatalogueForm
      schema={machineClassFieldsSchema}
      fields={MACHINE_FIELDS}
      action={action}
      hidden={{ vendor: vendorSlug, ...(id ? { id } : {}) }}
      defaultValues={defaultValues ?? { description: "", spindleKind: "constant-torque" }}
      submitLabel={id ? "Save machine class" : "Add machine class"}
      doneHref={(v) => `/${vendorSlug}/drafting/machine-classes/${String(v.slug)}`}
    />
  );
}
