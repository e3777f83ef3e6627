"use client";

import { ActionForm } from "@/components/drafting/action-form";
import { Field } from "@/components/forms/field";
import { geometryLabels } from "@/content-schema/catalogue-cutter";
import { operationKindLabels } from "@/content-schema/sheet-kinds";
import { sentList, type ActionState } from "@/lib/actions/action-state";

type Option = { id: string; label: string };
type Props = {
  action: (s: ActionState, f: FormData) => Promise<ActionState>;
  vendorSlug: string;
  materials: Option[];
  machineClasses: Option[];
};

const KINDS = ["slotting", "pocket", "constant-engagement", "profile", "finishing"] as const;
const errorText = (errors: Record<string, string[]>, prefix: string) =>
  Object.entries(errors)
    .filter(([k]) => k === prefix || k.startsWith(`${prefix}.`))
    .flatMap(([, v]) => v)
    .join(" ");

function Checks({
  legend,
  name,
  options,
  errors,
  sent,
  ticked = [],
}: {
  legend: string;
  name: string;
  options: Option[];
  errors: string;
  /** A refused form's state: the boxes it sent stay ticked. */
  sent: ActionState;
  ticked?: string[];
}) {
  const checked = sentList(sent, name) ?? ticked;
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="text-sm font-medium">{legend}</legend>
      <div className="flex flex-wrap gap-x-4 gap-y-1">
        {options.map((o) => (
          <label key={o.id} className="flex min-h-11 items-center gap-2 text-sm">
            <input type="checkbox" name={name} value={o.id} defaultChecked={checked.includes(o.id)} /> {o.label}
          </label>
        ))}
      </div>
      {errors ? (
        <p className="text-sm text-red-800">
          <span aria-hidden>⚠ </span>
          {errors}
        </p>
      ) : null}
    </fieldset>
  );
}

/** A new family: which cutters (series, geometry, diameter range, SKU list), materials, machine classes and operations. */
export function FamilyForm({ action, vendorSlug, materials, machineClasses }: Props) {
  return (
    <ActionForm action={action} hidden={{ vendor: vendorSlug }} submitLabel="Create family" label="New family">
      {(errors, sent) => (
        <div className="grid max-w-3xl gap-4">
          <Field label="Name" name="name" required errors={errors.name} defaultValue={sent.values?.name} />
          <Field
            label="Slug"
            name="slug"
            required
            defaultValue={sent.values?.slug}
            hint="Lowercase letters, digits and hyphens, e.g. sf-series-acrylic"
            errors={errors.slug}
          />
          <fieldset className="grid gap-3 rounded border border-stone-300 p-3 sm:grid-cols-3">
            <legend className="px-1 text-sm font-semibold">Cutters (all filters given apply together)</legend>
            <Field label="Series (SKU starts with)" name="series" errors={errors["cutters.series"]} defaultValue={sent.values?.series} />
            <Field
              label="Smallest D (mm)"
              name="diameterMinMm"
              inputMode="decimal"
              errors={errors["cutters.diameterMinMm"]}
              defaultValue={sent.values?.diameterMinMm}
            />
            <Field
              label="Largest D (mm)"
              name="diameterMaxMm"
              inputMode="decimal"
              errors={errors["cutters.diameterMaxMm"]}
              defaultValue={sent.values?.diameterMaxMm}
            />
            <div className="sm:col-span-3">
              <Checks
                legend="Geometry"
                name="geometries"
                options={Object.entries(geometryLabels).map(([id, label]) => ({ id, label }))}
                errors={errorText(errors, "cutters.geometries")}
                sent={sent}
              />
            </div>
            <label className="flex flex-col gap-1 text-sm font-medium sm:col-span-3">
              SKUs (one a line; empty: every cutter the filters pick)
              <textarea
                name="skus"
                rows={3}
                defaultValue={sent.values?.skus}
                className="rounded border border-stone-300 p-2 font-mono font-normal"
              />
            </label>
          </fieldset>
          <Checks legend="Materials" name="materialIds" options={materials} errors={errorText(errors, "materialIds")} sent={sent} />
          <Checks
            legend="Machine classes"
            name="machineClassIds"
            options={machineClasses}
            errors={errorText(errors, "machineClassIds")}
            sent={sent}
          />
          <Checks
            legend="Operations on every sheet"
            name="kinds"
            options={KINDS.map((k) => ({ id: k, label: operationKindLabels[k] }))}
            sent={sent}
            ticked={["slotting", "profile"]}
            errors={errorText(errors, "rules")}
          />
        </div>
      )}
    </ActionForm>
  );
}
