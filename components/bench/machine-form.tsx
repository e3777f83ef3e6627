"use client";

import { useState } from "react";

import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import { machineFormSchema } from "@/content-schema/machine-fields";
import { MACHINE_PRESETS, presetByKey } from "@/content-schema/machine-presets";
import { RIGIDITY_CLASSES } from "@/content-schema/machine-rigidity";
import { SPINDLE_KIND_KEYS, spindleKindLabels } from "@/content-schema/spindle-kind";
import type { ActionState } from "@/lib/actions/action-state";

export type MachineFormValues = {
  name: string;
  preset: string;
  rpmMin: string;
  rpmMax: string;
  powerKw: string;
  maxFeedMmMin: string;
  rigidity: string;
  zThrustN: string;
  spindleKind: string;
  ratedRpm: string;
  stickoutMm: string;
  units: string;
};

type Props = {
  vendorSlug: string;
  id?: string;
  initial: MachineFormValues;
  action: (state: ActionState, form: FormData) => Promise<ActionState>;
};

/** Register or edit a machine; a preset fills the fields with round starting values to correct. */
export function MachineForm({ vendorSlug, id, initial, action }: Props) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(action, machineFormSchema);
  const [values, setValues] = useState<MachineFormValues>(initial);
  const set = (key: keyof MachineFormValues) => (e: { target: { value: string } }) => setValues({ ...values, [key]: e.target.value });
  function applyPreset(key: string) {
    const p = presetByKey(key);
    if (!p) return setValues({ ...values, preset: "" });
    setValues({
      ...values,
      preset: p.key,
      name: values.name || p.label,
      rpmMin: String(p.rpmMin),
      rpmMax: String(p.rpmMax),
      powerKw: String(p.powerKw),
      maxFeedMmMin: `${p.maxFeedMmMin} mm/min`,
      rigidity: p.rigidity,
      zThrustN: p.zThrustN ? String(p.zThrustN) : "",
      spindleKind: p.spindleKind,
      ratedRpm: p.ratedRpm ? String(p.ratedRpm) : "",
      stickoutMm: `${p.stickoutMm} mm`,
    });
  }
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="grid max-w-3xl grid-cols-1 gap-4 sm:grid-cols-2">
      <input type="hidden" name="vendor" value={vendorSlug} />
      {id ? <input type="hidden" name="id" value={id} /> : null}
      <div className="flex flex-col gap-1 sm:col-span-2">
        <label htmlFor="f-preset" className="text-sm font-medium">
          Start from
        </label>
        <select
          id="f-preset"
          name="preset"
          value={values.preset}
          onChange={(e) => applyPreset(e.target.value)}
          className="min-h-11 rounded border border-stone-300 bg-white px-3"
        >
          <option value="">Nothing: I will type every number</option>
          {MACHINE_PRESETS.map((p) => (
            <option key={p.key} value={p.key}>
              {p.label}
            </option>
          ))}
        </select>
        <p className="text-xs text-stone-600">
          Round starting values for the category; correct them from your machine&apos;s documentation.
        </p>
      </div>
      <div className="sm:col-span-2">
        <Field label="Name" name="name" value={values.name} onChange={set("name")} errors={errors.name} />
      </div>
      <Field
        label="Lowest spindle speed (rpm)"
        name="rpmMin"
        inputMode="numeric"
        value={values.rpmMin}
        onChange={set("rpmMin")}
        errors={errors.rpmMin}
      />
      <Field
        label="Highest spindle speed (rpm)"
        name="rpmMax"
        inputMode="numeric"
        value={values.rpmMax}
        onChange={set("rpmMax")}
        errors={errors.rpmMax}
      />
      <Field
        label="Spindle power (kW)"
        name="powerKw"
        inputMode="decimal"
        value={values.powerKw}
        onChange={set("powerKw")}
        errors={errors.powerKw}
        hint="Rated output power of the spindle."
      />
      <Field
        label="Highest feed"
        name="maxFeedMmMin"
        value={values.maxFeedMmMin}
        onChange={set("maxFeedMmMin")}
        errors={errors.maxFeedMmMin}
        hint="e.g. 3000 mm/min or 120 in/min"
      />
      <div className="flex flex-col gap-1 sm:col-span-2">
        <label htmlFor="f-rigidity" className="text-sm font-medium">
          How stiff is it?
        </label>
        <select
          id="f-rigidity"
          name="rigidity"
          value={values.rigidity}
          onChange={set("rigidity")}
          className="min-h-11 rounded border border-stone-300 bg-white px-3"
        >
          {RIGIDITY_CLASSES.map((c) => (
            <option key={c.key} value={c.key}>
              {c.label}
            </option>
          ))}
        </select>
        {errors.rigidity ? <p className="text-sm text-red-800">⚠ {errors.rigidity.join(" ")}</p> : null}
      </div>
      <Field
        label="Z thrust limit, if known (N)"
        name="zThrustN"
        inputMode="decimal"
        value={values.zThrustN}
        onChange={set("zThrustN")}
        errors={errors.zThrustN}
        hint="How hard the Z axis can push a cutter down. Left empty: 150 N for a light machine, 400 N for a moderately stiff or stiff one, 1500 N for a very rigid one."
      />
      <div className="flex flex-col gap-1">
        <label htmlFor="f-spindleKind" className="text-sm font-medium">
          Spindle drive
        </label>
        <select
          id="f-spindleKind"
          name="spindleKind"
          value={values.spindleKind}
          onChange={set("spindleKind")}
          className="min-h-11 rounded border border-stone-300 bg-white px-3"
        >
          {SPINDLE_KIND_KEYS.map((k) => (
            <option key={k} value={k}>
              {spindleKindLabels[k]}
            </option>
          ))}
        </select>
        {errors.spindleKind ? <p className="text-sm text-red-800">⚠ {errors.spindleKind.join(" ")}</p> : null}
      </div>
      <Field
        label="Rated speed, if known (rpm)"
        name="ratedRpm"
        inputMode="numeric"
        value={values.ratedRpm}
        onChange={set("ratedRpm")}
        errors={errors.ratedRpm}
        hint="Where a VFD spindle reaches its rated power; below it the power falls with speed. Empty: the highest speed."
      />
      <Field
        label="Usual stick-out"
        name="stickoutMm"
        value={values.stickoutMm}
        onChange={set("stickoutMm")}
        errors={errors.stickoutMm}
        hint="Collet nut to tool tip, e.g. 20 mm or 3/4 in"
      />
      <div className="flex flex-col gap-1">
        <label htmlFor="f-units" className="text-sm font-medium">
          Show numbers in
        </label>
        <select
          id="f-units"
          name="units"
          value={values.units}
          onChange={set("units")}
          className="min-h-11 rounded border border-stone-300 bg-white px-3"
        >
          <option value="metric">Metric (mm, mm/min, kW)</option>
          <option value="imperial">Imperial (in, in/min, hp)</option>
        </select>
      </div>
      <div className="flex items-center gap-3 sm:col-span-2">
        <SubmitButton>{id ? "Save changes" : "Register machine"}</SubmitButton>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
